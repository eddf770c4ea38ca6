// Carriers on lanes: each lane is an ordered list from its front (nearest the end) to its rear.
// A carrier moves from stop point to stop point: its station, the lane end, or the place just behind
// the carrier ahead (that carrier's destination when it is moving, with the slower of the two
// profiles). It never starts a move into track another carrier holds, so carriers cannot overlap.
// Carriers that may be able to move are put on a wake ring and retried after the current event, so
// no handler re-enters another. A carrier held right behind another at rest may join it in a
// platoon (platoons.ts); a platoon moves as one, through its leader.
import { scheduleActive, scheduleActiveAt } from '../kernel/clock';
import { followerProfile, PROFILE_EMPTY, PROFILE_LOADED } from './motion';
import { canJoin, join, leaderOf, offsetMm, phaseOf, rearOf, ridersChangePhase } from './platoons';
import { EV_ARRIVE, EV_LANE_WAKE, PH_EXIT, PH_MOVING, PH_QUEUED, type LineState } from './state';
import { NONE, type CarrierIndex, type ConnIndex, type LaneIndex } from './indexes';

const EPS_MM = 1e-6;

/** Where the carrier's front is at time t (a rider: its leader's position less its place behind it). */
export function positionAt(m: LineState, c: CarrierIndex, t: number): number {
  const leader = leaderOf(m, c);
  const start = m.cPos[leader] - offsetMm(m, c);
  if (m.cPhase[leader] !== PH_MOVING) return start;
  return (
    start + m.line.motion.travelledMm(m.cDest[leader] - m.cPos[leader], m.cProfile[leader], t - m.cMoveStart[leader])
  );
}

/** Where the carrier will stand when its current move ends (where it stands, when at rest). */
export function destinationOf(m: LineState, c: CarrierIndex): number {
  const leader = leaderOf(m, c);
  return (m.cPhase[leader] === PH_MOVING ? m.cDest[leader] : m.cPos[leader]) - offsetMm(m, c);
}

/**
 * The point on its lane the carrier is heading for: its station there, else the lane end. A carrier
 * that has not yet chosen among a pooled step's stations stops at the first of them ahead on its
 * lane, where it decides.
 */
export function stopPoint(m: LineState, c: CarrierIndex): number {
  const lane = m.cLane[c];
  const target = m.cTarget[c];
  const line = m.line;
  let stop = line.laneLengthMm[lane];
  if (target < 0) return stop;
  if (m.cPending[c]) {
    const stations = line.stepStations[line.stationStep[target]];
    for (let i = 0; i < stations.length; i++) {
      const p = line.stationPositionMm[stations[i]];
      if (line.stationLane[stations[i]] === lane && p >= m.cPos[c] - EPS_MM && p < stop) stop = p;
    }
    return stop;
  }
  if (line.stationLane[target] === lane) {
    const p = line.stationPositionMm[target];
    if (p >= m.cPos[c] - EPS_MM) return p;
  }
  return stop;
}

export function wake(m: LineState, c: CarrierIndex): void {
  if (c < 0 || m.cWoken[c]) return;
  m.cWoken[c] = 1;
  const ring = m.wakeRing;
  // A wrap by comparison, not %: this runs several times per event.
  let at = m.wakeHead + m.wakeCount;
  if (at >= ring.length) at -= ring.length;
  ring[at] = c;
  m.wakeCount++;
}

/** Takes the next carrier to retry, or -1. */
export function nextWoken(m: LineState): CarrierIndex {
  if (m.wakeCount === 0) return NONE;
  const c = m.wakeRing[m.wakeHead];
  if (++m.wakeHead === m.wakeRing.length) m.wakeHead = 0;
  m.wakeCount--;
  m.cWoken[c] = 0;
  return c;
}

const isWaiting = (phase: number) => phase === PH_QUEUED || phase === PH_EXIT;

/** The transfer a waiting carrier will leave its lane by, or -1 (bound for a station ahead, or a direct link). */
function queueTransfer(m: LineState, c: CarrierIndex): ConnIndex {
  const lane = m.cLane[c];
  const target = m.cTarget[c];
  if (lane < 0 || target < 0) return NONE;
  const targetLane = m.line.stationLane[target];
  if (targetLane === lane && m.line.stationPositionMm[target] >= m.cPos[c] - EPS_MM) return NONE;
  const conn = m.line.routes.nextHop[lane * m.line.laneCount + targetLane];
  return conn >= 0 && m.line.connTransfer[conn] >= 0 ? conn : NONE;
}

export function setPhase(m: LineState, c: CarrierIndex, phase: number): void {
  const old = m.cPhase[c];
  if (old === phase) return;
  m.cPhase[c] = phase;
  m.observer.carrierPhases(old, phase, 1, m.now);
  if (m.cQueueConn[c] >= 0) {
    m.observer.transferQueue(m.cQueueConn[c], -1, m.now);
    m.cQueueConn[c] = NONE;
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
export function advance(m: LineState, c: CarrierIndex): 'moved' | 'atStop' | 'held' {
  const pos = m.cPos[c];
  const stop = stopPoint(m, c);
  let target = stop;
  const own = m.cLoaded[c] ? PROFILE_LOADED : PROFILE_EMPTY;
  let profile = own;
  const ahead = m.cAhead[c];
  if (ahead >= 0) {
    const moving = phaseOf(m, ahead) === PH_MOVING;
    const limit = destinationOf(m, ahead) - m.line.pitchMm;
    if (limit < target) target = limit;
    if (moving) profile = followerProfile(own, m.cProfile[leaderOf(m, ahead)]);
  }
  if (target <= pos + EPS_MM) {
    if (Math.abs(stop - pos) <= EPS_MM) return 'atStop';
    if (m.cPlatoon[c] < 0 && canJoin(m, c, ahead, stop, stopPoint(m, leaderOf(m, ahead)))) join(m, c, ahead);
    return 'held';
  }
  const duration = m.line.motion.moveSeconds(target - pos, profile);
  m.cDest[c] = target;
  m.cMoveStart[c] = m.now;
  m.cMoveEnd[c] = m.now + duration;
  m.cProfile[c] = profile;
  setPhase(m, c, PH_MOVING);
  ridersChangePhase(m, c, PH_QUEUED, PH_MOVING);
  scheduleActive(m, duration, EV_ARRIVE, c);
  const rear = rearOf(m, c);
  wake(m, m.cBehind[rear]);
  if (m.laneRear[m.cLane[c]] === rear) requestLaneCheck(m, m.cLane[c]);
  return 'moved';
}

/** Ends a move: the carrier (and its platoon) stands at its destination. */
export function completeMove(m: LineState, c: CarrierIndex): void {
  m.cPos[c] = m.cDest[c];
  setPhase(m, c, PH_QUEUED);
  ridersChangePhase(m, c, PH_MOVING, PH_QUEUED);
}

/** Puts a carrier at the start of a lane, whole carrier on the lane, as its new rear. */
export function attach(m: LineState, c: CarrierIndex, lane: LaneIndex, front: number): void {
  const rear = m.laneRear[lane];
  m.cLane[c] = lane;
  m.cSeq[c] = m.laneSeq[lane]++;
  m.cPos[c] = front;
  m.cDest[c] = front;
  m.cAhead[c] = rear;
  m.cBehind[c] = NONE;
  if (rear >= 0) m.cBehind[rear] = c;
  else m.laneFront[lane] = c;
  m.laneRear[lane] = c;
  m.laneCarriers[lane]++;
  m.observer.laneCarriers(lane, m.laneCarriers[lane], m.now);
}

/** Takes the front carrier off its lane; the one behind may close up, the lane may take a new carrier. */
export function detachFront(m: LineState, c: CarrierIndex): void {
  const lane = m.cLane[c];
  const behind = m.cBehind[c];
  m.laneFront[lane] = behind;
  if (behind >= 0) m.cAhead[behind] = NONE;
  else m.laneRear[lane] = NONE;
  m.cBehind[c] = NONE;
  m.cLane[c] = NONE;
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
function clearsEntryAt(m: LineState, rear: CarrierIndex): number {
  const needed = m.line.carrierLengthMm + m.line.pitchMm;
  if (destinationOf(m, rear) < needed - EPS_MM) return Infinity;
  // The rear moves as its leader does, offset behind it.
  const leader = leaderOf(m, rear);
  const start = m.cPos[leader];
  return (
    m.cMoveStart[leader] +
    m.line.motion.secondsToCover(
      m.cDest[leader] - start,
      m.cProfile[leader],
      needed - EPS_MM / 2 + offsetMm(m, rear) - start,
    )
  );
}

/** Whether a carrier can be put at the lane start now (the rear carrier has cleared it). */
export function entryClear(m: LineState, lane: LaneIndex): boolean {
  const rear = m.laneRear[lane];
  if (rear < 0) return true;
  if (phaseOf(m, rear) === PH_MOVING) return m.now >= clearsEntryAt(m, rear);
  return positionAt(m, rear, m.now) >= m.line.carrierLengthMm + m.line.pitchMm - EPS_MM;
}

/** Schedules a lane check for the moment the moving rear carrier clears the lane start. */
export function scheduleEntryWake(m: LineState, lane: LaneIndex): void {
  const rear = m.laneRear[lane];
  if (rear < 0 || phaseOf(m, rear) !== PH_MOVING || m.laneWakePending[lane]) return;
  const at = clearsEntryAt(m, rear);
  if (at === Infinity) return;
  m.laneWakePending[lane] = 1;
  scheduleActiveAt(m, Math.max(m.now, at), EV_LANE_WAKE, lane);
}

/** Marks a lane whose entry should be re-examined after the current event, if anything waits for it. */
export function requestLaneCheck(m: LineState, lane: LaneIndex): void {
  if (m.laneRequests[lane].length === 0 || m.laneDirty[lane]) return;
  m.laneDirty[lane] = 1;
  m.laneRing.push(lane);
}
