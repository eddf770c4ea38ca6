// Queues that advance as a block. Carriers standing nose to tail one pitch apart, heading for the
// same stop point with the same load state and bound for the same transfer, form a platoon: its
// front carrier (the leader) holds the motion and the only pending event; the others (riders) copy
// it exactly, one pitch apart, so a rider's position is the leader's minus its place behind it times
// the pitch, computed when someone asks. When the queue moves up, one move and one arrival serve the
// whole platoon, so the work per part does not grow with the number of carriers queued.
//
// Why this stays exact: riders share the leader's start time, distance and profile, which is what
// each would have done on its own (a follower starting from rest one pitch behind a leader that
// starts with the same profile moves in lock step). A rider can never pass its stop point before the
// leader reaches its own, because all share one stop point and the riders stand behind. The leader
// leaves the platoon at that stop point (into a station, a decision, or a lane end); the carrier
// behind takes over with the motion state made real. Carriers on a lane carry consecutive sequence
// numbers (they join at the rear and leave at the front), which gives a rider's place in one step.
import type { LineState } from './state';
import { PH_MOVING, PH_QUEUED } from './state';

/** The carrier whose motion this carrier follows: its platoon's leader, or itself. */
export function leaderOf(m: LineState, c: number): number {
  const p = m.cPlatoon[c];
  return p < 0 ? c : m.pLeader[p];
}

/** How far behind its leader a carrier stands (0 for a leader or a carrier on its own). */
export function offsetMm(m: LineState, c: number): number {
  const p = m.cPlatoon[c];
  return p < 0 ? 0 : (m.cSeq[c] - m.cSeq[m.pLeader[p]]) * m.line.pitchMm;
}

export function phaseOf(m: LineState, c: number): number {
  return m.cPhase[leaderOf(m, c)];
}

/** The last carrier of the carrier's platoon, or itself. */
export function rearOf(m: LineState, c: number): number {
  const p = m.cPlatoon[c];
  return p < 0 ? c : m.pRear[p];
}

/** Riders that change phase with their leader. */
export function ridersOf(m: LineState, c: number): number {
  const p = m.cPlatoon[c];
  return p < 0 ? 0 : m.pSize[p] - 1;
}

/** The leader's riders change phase with it: counted at once for the recorder. */
export function ridersChangePhase(m: LineState, leader: number, from: number, to: number): void {
  const riders = ridersOf(m, leader);
  if (riders === 0) return;
  m.observer.carrierPhases(from, to, riders, m.now);
  const conn = m.pConn[m.cPlatoon[leader]];
  if (conn >= 0) m.observer.transferQueue(conn, from === PH_QUEUED ? -riders : riders, m.now);
}

function allocate(m: LineState): number {
  return m.pFree[--m.pFreeTop];
}

/**
 * Carrier c, at rest and held by the carrier right ahead of it (at rest too, exactly one pitch
 * ahead, same stop point, load state and transfer queue), rides with it from now on.
 */
export function join(m: LineState, c: number, ahead: number): void {
  let p = m.cPlatoon[ahead];
  if (p < 0) {
    p = allocate(m);
    m.cPlatoon[ahead] = p;
    m.pLeader[p] = ahead;
    m.pRear[p] = ahead;
    m.pSize[p] = 1;
    m.pConn[p] = m.cQueueConn[ahead];
  }
  m.cPlatoon[c] = p;
  m.pRear[p] = c;
  m.pSize[p]++;
}

/**
 * The leader has reached the platoon's stop point (the platoon stands still): it leaves, and the
 * carrier behind it leads the rest, with its position and phase made real.
 */
export function leave(m: LineState, leader: number): void {
  const p = m.cPlatoon[leader];
  if (p < 0) return;
  m.cPlatoon[leader] = -1;
  const next = m.cBehind[leader];
  m.cPos[next] = m.cPos[leader] - m.line.pitchMm;
  m.cDest[next] = m.cPos[next];
  m.cPhase[next] = PH_QUEUED;
  m.cQueueConn[next] = m.pConn[p];
  if (--m.pSize[p] === 1) {
    m.cPlatoon[next] = -1;
    m.pFree[m.pFreeTop++] = p;
  } else m.pLeader[p] = next;
}

/** Whether c, held at rest right behind ahead, can ride with it. */
export function canJoin(m: LineState, c: number, ahead: number, stop: number, aheadStop: number): boolean {
  if (ahead < 0 || m.cAtStation[c] >= 0 || m.cAtStation[ahead] >= 0 || phaseOf(m, ahead) !== PH_QUEUED) return false;
  if (m.cLoaded[c] !== m.cLoaded[ahead] || Math.abs(stop - aheadStop) > 1e-6) return false;
  if (m.cQueueConn[c] !== (m.cPlatoon[ahead] >= 0 ? m.pConn[m.cPlatoon[ahead]] : m.cQueueConn[ahead])) return false;
  const gap = m.cPos[leaderOf(m, ahead)] - offsetMm(m, ahead) - m.cPos[c];
  return Math.abs(gap - m.line.pitchMm) <= 1e-6;
}

/** A moving platoon's riders are moving; anything else about a rider is its leader's. */
export const isMoving = (m: LineState, c: number) => phaseOf(m, c) === PH_MOVING;
