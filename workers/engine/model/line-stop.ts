// Whole-line planned stops (calendar breakMode 'wholeLine'): for the length of a break nothing on the
// line moves or works. Rather than interrupt every move, station cycle and transfer, a stop postpones
// every pending line event and every running move by the break's length, so the line resumes exactly
// as it stood, its kinematics intact (a carrier halted mid-move finishes the same move afterwards).
// Repairs wait too: the stop is planned for everyone. While stopped, stations report the break,
// carriers that were moving report waiting, and transfers report idle.
import { leaderOf, ridersOf } from './platoons';
import { EV_LAST_ACTIVE, PH_MOVING, PH_QUEUED, TR_IDLE, type LineState } from './state';
import type { CarrierIndex } from './indexes';

/** Each moving platoon leader (a carrier on its own leads itself); its riders move with it. */
function forEachMovingLeader(m: LineState, visit: (leader: CarrierIndex) => void): void {
  for (let i = 0; i < m.line.carrierCount; i++) {
    const c = i as CarrierIndex;
    if (m.cPhase[c] === PH_MOVING && leaderOf(m, c) === c) visit(c);
  }
}

function reportPhase(m: LineState, leader: CarrierIndex, from: number, to: number): void {
  m.observer.carrierPhases(from, to, 1 + ridersOf(m, leader), m.now);
}

export function stopLine(m: LineState, until: number): void {
  const delay = until - m.now;
  m.stoppedUntil = until;
  m.queue.postpone(delay, EV_LAST_ACTIVE);
  forEachMovingLeader(m, (c) => {
    m.cMoveStart[c] += delay;
    m.cMoveEnd[c] += delay;
    reportPhase(m, c, PH_MOVING, PH_QUEUED);
  });
  for (let s = 0; s < m.line.stationCount; s++) if (m.sSegmentActive[s]) m.sSegmentStart[s] += delay;
  for (let k = 0; k < m.line.connCount; k++) if (m.tState[k] !== TR_IDLE) m.observer.transferState(k, TR_IDLE, m.now);
}

export function restartLine(m: LineState): void {
  m.stoppedUntil = -Infinity;
  forEachMovingLeader(m, (c) => reportPhase(m, c, PH_QUEUED, PH_MOVING));
  for (let k = 0; k < m.line.connCount; k++)
    if (m.tState[k] !== TR_IDLE) m.observer.transferState(k, m.tState[k], m.now);
}

/** The time at which positions are read: while stopped, the carriers stand where the stop left them. */
export function positionClock(m: LineState, t: number): number {
  return t < m.stoppedUntil ? m.stoppedUntil : t;
}
