// Carriers on lanes: each lane is an ordered list from its front (nearest the end) to its rear.
// A carrier moves from stop point to stop point: its station, the lane end, or the place just behind
// the carrier ahead (that carrier's destination when it is moving, with the slower of the two
// profiles). It never starts a move into track another carrier holds, so carriers cannot overlap.
// Carriers that may be able to move are put on a wake ring and retried after the current event, so
// no handler re-enters another.
import { followerProfile, PROFILE_EMPTY, PROFILE_LOADED } from './motion';
import { EV_ARRIVE, EV_LANE_WAKE, PH_EXIT, PH_MOVING, PH_QUEUED, scheduleActive, scheduleActiveAt, type LineState } from './state';

const EPS_MM = 1e-6;

/** Where the carrier's front is at time t. */
export function positionAt(m: LineState, c: number, t: number): number {
  if (m.cPhase[c] !== PH_MOVING) return m.cPos[c];
  const start = m.cPos[c];
  return start + m.line.motion.travelledMm(m.cDest[c] - start, m.cProfile[c], t - m.cMoveStart[c]);
}

/** The point on its lane the carrier is heading for: its station there, else the lane end. */
export function stopPoint(m: LineState, c: number): number {
  const lane = m.cLane[c];
  const target = m.cTarget[c];
  if (target >= 0 && m.line.stationLane[target] === lane) {
    const p = m.line.stationPositionMm[target];
    if (p >= m.cPos[c] - EPS_MM) return p;
  }
  return m.line.laneLengthMm[lane];
}

export function wake(m: LineState, c: number): void {
  if (c < 0 || m.cWoken[c]) return;
  m.cWoken[c] = 1;
  const ring = m.wakeRing;
  ring[(m.wakeHead + m.wakeCount) % ring.length] = c;
  m.wakeCount++;
}

/** Takes the next carrier to retry, or -1. */
export function nextWoken(m: LineState): number {
  if (m.wakeCount === 0) return -1;
  const c = m.wakeRing[m.wakeHead];
  m.wakeHead = (m.wakeHead + 1) % m.wakeRing.length;
  m.wakeCount--;
  m.cWoken[c] = 0;
  return c;
}

const isWaiting = (phase: number) => phase === PH_QUEUED || phase === PH_EXIT;

/** The transfer a waiting carrier will leave its lane by, or -1 (bound for a station ahead, or a direct link). */
function queueTransfer(m: LineState, c: number): number {
  const lane = m.cLane[c];
  const target = m.cTarget[c];
  if (lane < 0 || target < 0) return -1;
  const targetLane = m.line.stationLane[target];
  if (targetLane === lane && m.line.stationPositionMm[target] >= m.cPos[c] - EPS_MM) return -1;
  const conn = m.line.routes.nextHop[lane * m.line.laneCount + targetLane];
  return conn >= 0 && m.line.connTransfer[conn] >= 0 ? conn : -1;
}

export function setPhase(m: LineState, c: number, phase: number): void {
  const old = m.cPhase[c];
  if (old === phase) return;
  m.cPhase[c] = phase;
  m.observer.carrierPhase(c, phase, m.now);
  if (m.cQueueConn[c] >= 0) {
    m.observer.transferQueue(m.cQueueConn[c], -1, m.now);
    m.cQueueConn[c] = -1;
  }
  if (isWaiting(phase)) {
    const conn = queueTransfer(m, c);
    m.cQueueConn[c] = conn;
    if (conn >= 0) m.observer.transferQueue(conn, 1, m.now);
  }
}

/**
 * Starts the carrier towards its stop point as far as the track allows. Returns 'moved', 'atStop'
 * when it already stands at its stop point, or 'held' when the carrier ahead leaves no room.
 */
export function advance(m: LineState, c: number): 'moved' | 'atStop' | 'held' {
  const pos = m.cPos[c];
  const stop = stopPoint(m, c);
  let target = stop;
  const own = m.cLoaded[c] ? PROFILE_LOADED : PROFILE_EMPTY;
  let profile = own;
  const ahead = m.cAhead[c];
  if (ahead >= 0) {
    const moving = m.cPhase[ahead] === PH_MOVING;
    const limit = (moving ? m.cDest[ahead] : m.cPos[ahead]) - m.line.pitchMm;
    if (limit < target) target = limit;
    if (moving) profile = followerProfile(own, m.cProfile[ahead]);
  }
  if (target <= pos + EPS_MM) return Math.abs(stop - pos) <= EPS_MM ? 'atStop' : 'held';
  const duration = m.line.motion.moveSeconds(target - pos, profile);
  m.cDest[c] = target;
  m.cMoveStart[c] = m.now;
  m.cMoveEnd[c] = m.now + duration;
  m.cProfile[c] = profile;
  setPhase(m, c, PH_MOVING);
  scheduleActive(m, duration, EV_ARRIVE, c);
  wake(m, m.cBehind[c]);
  if (m.laneRear[m.cLane[c]] === c) requestLaneCheck(m, m.cLane[c]);
  return 'moved';
}

/** Ends a move: the carrier stands at its destination. */
export function completeMove(m: LineState, c: number): void {
  m.cPos[c] = m.cDest[c];
  setPhase(m, c, PH_QUEUED);
}

/** Puts a carrier at the start of a lane, whole carrier on the lane, as its new rear. */
export function attach(m: LineState, c: number, lane: number, front: number): void {
  const rear = m.laneRear[lane];
  m.cLane[c] = lane;
  m.cPos[c] = front;
  m.cDest[c] = front;
  m.cAhead[c] = rear;
  m.cBehind[c] = -1;
  if (rear >= 0) m.cBehind[rear] = c;
  else m.laneFront[lane] = c;
  m.laneRear[lane] = c;
  m.laneCarriers[lane]++;
  m.observer.laneCarriers(lane, m.laneCarriers[lane], m.now);
}

/** Takes the front carrier off its lane; the one behind may close up, the lane may take a new carrier. */
export function detachFront(m: LineState, c: number): void {
  const lane = m.cLane[c];
  const behind = m.cBehind[c];
  m.laneFront[lane] = behind;
  if (behind >= 0) m.cAhead[behind] = -1;
  else m.laneRear[lane] = -1;
  m.cBehind[c] = -1;
  m.cLane[c] = -1;
  m.laneCarriers[lane]--;
  m.observer.laneCarriers(lane, m.laneCarriers[lane], m.now);
  wake(m, behind);
  requestLaneCheck(m, lane);
}

/**
 * When the moving rear carrier clears the lane start (aimed half the tolerance past the threshold, so
 * rounding never lets a carrier in a hair too early), or Infinity when this move stops short of it.
 * Entry is decided by comparing the clock with this time, never by recomputing a position from the
 * clock: late in a long run a time difference carries rounding of the clock's magnitude, and a
 * position recomputed from it could stay a hair short of the threshold at the very event scheduled
 * for the crossing, so the lane would be woken again and again at the same instant.
 */
function clearsEntryAt(m: LineState, rear: number): number {
  const needed = m.line.carrierLengthMm + m.line.pitchMm;
  if (m.cDest[rear] < needed - EPS_MM) return Infinity;
  const start = m.cPos[rear];
  return m.cMoveStart[rear] + m.line.motion.secondsToCover(m.cDest[rear] - start, m.cProfile[rear], needed - EPS_MM / 2 - start);
}

/** Whether a carrier can be put at the lane start now (the rear carrier has cleared it). */
export function entryClear(m: LineState, lane: number): boolean {
  const rear = m.laneRear[lane];
  if (rear < 0) return true;
  if (m.cPhase[rear] === PH_MOVING) return m.now >= clearsEntryAt(m, rear);
  return m.cPos[rear] >= m.line.carrierLengthMm + m.line.pitchMm - EPS_MM;
}

/** Schedules a lane check for the moment the moving rear carrier clears the lane start. */
export function scheduleEntryWake(m: LineState, lane: number): void {
  const rear = m.laneRear[lane];
  if (rear < 0 || m.cPhase[rear] !== PH_MOVING || m.laneWakePending[lane]) return;
  const at = clearsEntryAt(m, rear);
  if (at === Infinity) return;
  m.laneWakePending[lane] = 1;
  scheduleActiveAt(m, Math.max(m.now, at), EV_LANE_WAKE, lane);
}

/** Marks a lane whose entry should be re-examined after the current event, if anything waits for it. */
export function requestLaneCheck(m: LineState, lane: number): void {
  if (m.laneRequests[lane].length === 0 || m.laneDirty[lane]) return;
  m.laneDirty[lane] = 1;
  m.laneRing.push(lane);
}
