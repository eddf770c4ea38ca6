// Describes a line that can no longer move: every carrier, where it stands and what it waits for,
// in words a planner can act on (which lane start, transfer or carrier holds it up), and, when
// simulated time stops passing, which zero times of the scenario can cause that.
import type { Distribution } from '../../../shared/scenario/distribution';
import type { GridlockEntry } from '../kernel/stop';
import type { CompiledLine } from './compile';
import { positionAt } from './lanes';
import { phaseOf } from './platoons';
import { PH_EXIT, PH_STATION, PH_TRANSFER, TR_HOLDING, type LineState } from './state';
import type { CarrierIndex, ConnIndex, LaneIndex } from './indexes';

function laneId(m: LineState, lane: LaneIndex): string {
  return m.line.scenario.lanes[lane].id;
}

function connName(m: LineState, conn: ConnIndex): string {
  const t = m.line.connTransfer[conn];
  if (t >= 0) return `transfer "${m.line.scenario.transfers[t].id}"`;
  return `link to lane "${laneId(m, m.line.connTo[conn])}"`;
}

function where(m: LineState, c: CarrierIndex): string {
  if (phaseOf(m, c) === PH_TRANSFER) {
    for (let k = 0; k < m.line.connCount; k++) if (m.tCarrier[k] === c) return connName(m, k as ConnIndex);
    return 'a transfer';
  }
  const atStation = m.cAtStation[c] >= 0 ? ` (station "${m.line.stationIds[m.cAtStation[c]]}")` : '';
  return `lane "${laneId(m, m.cLane[c])}" at ${positionAt(m, c, m.now).toFixed(0)} mm${atStation}`;
}

function waitingFor(m: LineState, c: CarrierIndex): string {
  const step = m.cTarget[c] >= 0 ? m.line.stationStep[m.cTarget[c]] : -1;
  const target =
    step < 0
      ? 'nothing'
      : m.cPending[c]
        ? `a station of step "${m.line.scenario.steps[step].id}"`
        : `station "${m.line.stationIds[m.cTarget[c]]}"`;
  if (step >= 0 && m.stepWaiting[step].includes(c)) return `room on the way to ${target}: every station's lane is full`;
  const phase = phaseOf(m, c);
  if (phase === PH_TRANSFER) {
    for (let k = 0; k < m.line.connCount; k++) {
      if (m.tCarrier[k] === c && m.tState[k] === TR_HOLDING)
        return `room at the start of lane "${laneId(m, m.line.connTo[k])}" (heading for ${target})`;
    }
    return `its transfer (heading for ${target})`;
  }
  if (phase === PH_STATION) return `work at ${target}`;
  if (phase === PH_EXIT) {
    const conn = m.cConn[c];
    if (m.line.connKind[conn] === 0)
      return `room at the start of lane "${laneId(m, m.line.connTo[conn])}" (heading for ${target})`;
    return `${connName(m, conn)} to become free (heading for ${target})`;
  }
  const ahead = m.cAhead[c];
  return ahead >= 0 ? `carrier ${ahead} ahead of it (heading for ${target})` : `its way to ${target}`;
}

export function gridlockReport(m: LineState): GridlockEntry[] {
  const out: GridlockEntry[] = [];
  for (let i = 0; i < m.line.carrierCount; i++) {
    const c = i as CarrierIndex;
    out.push({ carrier: c, at: where(m, c), waitingFor: waitingFor(m, c) });
  }
  return out;
}

const canBeZero = (d: Distribution) =>
  (d.kind === 'fixed' && d.value === 0) || (d.kind === 'empirical' && d.samples.includes(0));

/** Stations and transfers that can take no time at all: the only way a valid scenario stops the clock. */
export function zeroTimes(line: CompiledLine): string[] {
  const s = line.scenario;
  const stations = s.steps.flatMap((step) =>
    step.stations.filter((st) => canBeZero(st.cycleTimeSeconds)).map((st) => `station "${st.id}" (cycle time)`),
  );
  const transfers = s.transfers
    .filter((_, j) => line.connCarrySeconds[s.links.length + j] === 0)
    .map((t) => `transfer "${t.id}" (handling and travel)`);
  return [...stations, ...transfers];
}

/** Why simulated time stopped passing, blaming the scenario's zero times only when it has some. */
export function stallMessage(line: CompiledLine, events: number, t: number): string {
  const where = `no simulated time passed in ${events} events at t=${t.toFixed(3)} s`;
  const zeros = zeroTimes(line);
  if (zeros.length > 0)
    return `${where}: carriers are cycling in zero time; give these a time above zero: ${zeros.join(', ')}`;
  return `${where}, although every cycle and transfer time of this scenario is above zero: this is a fault of the engine, not of the scenario; please report it with the scenario file and run settings`;
}
