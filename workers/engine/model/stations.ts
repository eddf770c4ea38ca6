// Stations: work on the carrier standing at them, fail and get repaired, pause for breaks. Work is
// done in segments that end at completion or at the next failure, whichever comes first; time to
// failure counts operating (processing) time only, so a starved or blocked station does not fail.
// A failure or a break pauses the work, which resumes where it stopped. Repairs run in elapsed time.
// A segment that runs to its scheduled end takes off exactly its planned length, so the work or the
// time to failure that ended it reaches zero exactly, however large the clock: no tolerance on times.
import { scheduleActive } from '../kernel/clock';
import { STEP_INSPECT, STEP_LOAD, STEP_UNLOAD } from './compile';
import { chooseStation, unassign } from './dispatch';
import { setPhase, wake } from './lanes';
import {
  EV_REPAIR_END,
  EV_SEGMENT_END,
  PH_QUEUED,
  PH_STATION,
  ST_BLOCKED,
  ST_BREAK,
  ST_DOWN,
  ST_PROCESSING,
  ST_STARVED,
  type LineState,
} from './state';
import { NONE, type CarrierIndex, type StationIndex, type StepIndex } from './indexes';

function onBreak(m: LineState, s: StationIndex): boolean {
  return m.breakActive && (m.line.wholeLineBreaks || m.line.stationPausesForBreaks[s] === 1);
}

export function updateStationState(m: LineState, s: StationIndex): void {
  let state: number;
  if (m.sDown[s]) state = ST_DOWN;
  else if (onBreak(m, s)) state = ST_BREAK;
  else if (m.sCarrier[s] < 0) state = ST_STARVED;
  else state = m.sDone[s] ? ST_BLOCKED : ST_PROCESSING;
  if (state === m.sState[s]) return;
  m.sState[s] = state;
  m.observer.stationState(s, state, m.now);
}

function resume(m: LineState, s: StationIndex): void {
  if (m.sCarrier[s] < 0 || m.sDone[s] || m.sDown[s] || m.sSegmentActive[s] || onBreak(m, s)) return;
  const segment = Math.min(m.sWorkLeft[s], m.sToFailure[s]);
  m.sSegmentActive[s] = 1;
  m.sSegmentStart[s] = m.now;
  m.sSegmentLength[s] = segment;
  m.sGen[s]++;
  scheduleActive(m, segment, EV_SEGMENT_END, s, m.sGen[s]);
}

/** Stops the running segment; elapsed is its whole planned length when it ran to its end. */
function pause(
  m: LineState,
  s: StationIndex,
  elapsed = Math.min(Math.max(0, m.now - m.sSegmentStart[s]), m.sSegmentLength[s]),
): void {
  if (!m.sSegmentActive[s]) return;
  m.sWorkLeft[s] -= elapsed;
  m.sToFailure[s] -= elapsed;
  m.sSegmentActive[s] = 0;
  m.sGen[s]++;
}

export function arriveAtStation(m: LineState, c: CarrierIndex, s: StationIndex): void {
  const work = m.samplers[s].cycle() + m.line.locateSeconds;
  m.observer.cycleSampled(s, work);
  m.cAtStation[c] = s;
  m.sCarrier[s] = c;
  m.sDone[s] = 0;
  m.sWorkLeft[s] = work;
  setPhase(m, c, PH_STATION);
  resume(m, s);
  updateStationState(m, s);
}

/** The carrier has started to move away: the station waits for its next carrier. */
export function releaseStation(m: LineState, c: CarrierIndex): void {
  const s = m.cAtStation[c];
  m.cAtStation[c] = NONE;
  m.sCarrier[s] = NONE;
  m.sDone[s] = 0;
  updateStationState(m, s);
}

function fail(m: LineState, s: StationIndex): void {
  m.sDown[s] = 1;
  m.observer.failure(s, m.now);
  scheduleActive(m, m.samplers[s].repair?.() ?? 0, EV_REPAIR_END, s);
}

export function onSegmentEnd(m: LineState, s: StationIndex, generation: number): void {
  if (generation !== m.sGen[s] || !m.sSegmentActive[s]) return;
  pause(m, s, m.sSegmentLength[s]);
  if (m.sWorkLeft[s] <= 0) finishWork(m, s);
  if (m.sToFailure[s] <= 0) fail(m, s);
  else resume(m, s);
  updateStationState(m, s);
}

export function onRepairEnd(m: LineState, s: StationIndex): void {
  m.sDown[s] = 0;
  m.sToFailure[s] = m.samplers[s].failure?.() ?? Infinity;
  resume(m, s);
  updateStationState(m, s);
}

/**
 * Starts or ends a break. Manual stations that pause for breaks stop their work and resume it; in a
 * whole-line stop every station reports the break, and its work waits with the rest of the line
 * (line-stop.ts postpones it), so nothing is paused here.
 */
export function setBreak(m: LineState, active: boolean): void {
  m.breakActive = active;
  for (let i = 0; i < m.line.stationCount; i++) {
    const s = i as StationIndex;
    if (!m.line.wholeLineBreaks) {
      if (!m.line.stationPausesForBreaks[s]) continue;
      if (active) pause(m, s);
      else resume(m, s);
    }
    updateStationState(m, s);
  }
}

/** What the finished step does to the part, and which step and station the carrier needs next. */
function finishWork(m: LineState, s: StationIndex): void {
  const c = m.sCarrier[s];
  const step = m.line.stationStep[s];
  const kind = m.line.stepKind[step];
  m.sDone[s] = 1;
  m.observer.operationDone(s, m.now);
  unassign(m, s);
  let next = (step + 1) as StepIndex;
  if (kind === STEP_LOAD) {
    m.cLoaded[c] = 1;
    m.cLoadTime[c] = m.now;
    m.observer.loaded(m.now, m.cLastLoad[c] >= 0 ? m.now - m.cLastLoad[c] : -1);
    m.cLastLoad[c] = m.now;
    m.observer.wip(++m.wip, m.now);
  } else if (kind === STEP_UNLOAD) {
    m.cLoaded[c] = 0;
    m.observer.output(m.now, m.now - m.cLoadTime[c]);
    m.observer.wip(--m.wip, m.now);
    next = 0 as StepIndex;
  } else if (kind === STEP_INSPECT) {
    const u = m.samplers[s].inspect?.() ?? 1;
    const reject = m.line.stepRejectShare[step];
    if (u < reject) {
      m.cLoaded[c] = 0;
      m.observer.scrapped(m.now, m.now - m.cLoadTime[c]);
      m.observer.wip(--m.wip, m.now);
      next = 0 as StepIndex;
    } else if (u < reject + m.line.stepReworkShare[step]) {
      m.observer.reworked(m.now);
      next = m.line.stepReworkTarget[step];
    }
  }
  m.cStep[c] = next;
  chooseStation(m, next, c);
  setPhase(m, c, PH_QUEUED);
  wake(m, c);
}

/** Initial failure clocks; stations without failures never fail. */
export function startFailureClocks(m: LineState): void {
  for (let s = 0; s < m.line.stationCount; s++) m.sToFailure[s] = m.samplers[s].failure?.() ?? Infinity;
}
