// Self-checks of the line model, switched on in tests: carriers never overlap or leave their lane,
// no carrier is lost or duplicated, and WIP equals the carriers holding a part.
import { positionAt } from './lanes';
import { positionClock } from './line-stop';
import { leaderOf, phaseOf } from './platoons';
import { PH_MOVING, PH_TRANSFER, type LineState } from './state';
import { NONE, type CarrierIndex, type LaneIndex } from './indexes';

const EPS_MM = 1e-6;

/**
 * Tolerance for positions computed from the clock at time t: a time difference late in a run carries
 * rounding of a few units in the last place of t, which the fastest carrier turns into distance.
 */
function slackMm(m: LineState, t: number): number {
  const s = m.line.scenario;
  const fastest =
    s.conveyor.kind === 'belt'
      ? s.conveyor.speedMmPerS
      : Math.max(s.carriers.loaded.vMaxMmPerS, s.carriers.empty?.vMaxMmPerS ?? 0);
  return EPS_MM + 4 * fastest * Math.abs(t) * Number.EPSILON;
}

/** Moves are never re-planned before they end, so the pair's future positions up to the first arrival are known. */
function checkPair(m: LineState, ahead: CarrierIndex, behind: CarrierIndex, lane: LaneIndex): void {
  const moveEnd = (c: CarrierIndex) => (phaseOf(m, c) === PH_MOVING ? m.cMoveEnd[leaderOf(m, c)] : Infinity);
  const until = Math.min(moveEnd(ahead), moveEnd(behind));
  const from = positionClock(m, m.now);
  const horizon = Number.isFinite(until) ? until - from : 0;
  for (let k = 0; k <= 4; k++) {
    const t = from + (horizon * k) / 4;
    const clearance = positionAt(m, ahead, t) - positionAt(m, behind, t);
    if (clearance < m.line.pitchMm - slackMm(m, t)) {
      throw new Error(
        `invariant: carriers ${ahead} and ${behind} on lane ${lane} are ${clearance} mm apart, less than ${m.line.pitchMm} mm, at t=${t}`,
      );
    }
    if (horizon === 0) return;
  }
}

export function checkInvariants(m: LineState): void {
  const line = m.line;
  let onLanes = 0;
  for (let l = 0; l < line.laneCount; l++) {
    const lane = l as LaneIndex;
    let previous: CarrierIndex = NONE;
    let count = 0;
    for (let c = m.laneFront[lane]; c >= 0; c = m.cBehind[c]) {
      count++;
      if (m.cLane[c] !== lane)
        throw new Error(`invariant: carrier ${c} is listed on lane ${lane} but records lane ${m.cLane[c]}`);
      const head = positionAt(m, c, positionClock(m, m.now));
      const slack = slackMm(m, m.now);
      if (head < line.carrierLengthMm - slack || head > line.laneLengthMm[lane] + slack) {
        throw new Error(
          `invariant: carrier ${c} front at ${head} mm is off lane ${lane} (length ${line.laneLengthMm[lane]} mm) at t=${m.now}`,
        );
      }
      if (previous >= 0) checkPair(m, previous, c, lane);
      previous = c;
    }
    if (count !== m.laneCarriers[lane])
      throw new Error(`invariant: lane ${lane} counts ${m.laneCarriers[lane]} carriers but lists ${count}`);
    onLanes += count;
  }
  let inTransfers = 0;
  for (let c = 0; c < line.carrierCount; c++) if (phaseOf(m, c as CarrierIndex) === PH_TRANSFER) inTransfers++;
  if (onLanes + inTransfers !== line.carrierCount) {
    throw new Error(
      `invariant: ${onLanes} carriers on lanes and ${inTransfers} in transfers, but the line has ${line.carrierCount}`,
    );
  }
  let loaded = 0;
  for (let c = 0; c < line.carrierCount; c++) loaded += m.cLoaded[c];
  if (loaded !== m.wip) throw new Error(`invariant: ${loaded} carriers hold a part but WIP is ${m.wip}`);
}
