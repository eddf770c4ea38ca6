// Picks which of a step's stations a carrier is sent to. A station's queue is the carriers assigned
// to it: at it or on their way.
//
// Pooled steps (the default) decide late, where the routes to the step's stations part: at a lane
// end whose next hops to them differ, or on reaching a station of the step on the carrier's own lane
// (stop here, run on to a further one, or leave the lane). Until then the carrier is pending: it
// follows the common route and counts in no station's queue. At a lane end it takes the shortest
// queue among the stations whose lane still has room for one more (stationRoom), and waits there
// while none has: the lane before the split is then the step's one shared queue. On its own lane it
// never waits (it stands on the way to the stations further on), so it takes the shortest queue.
//
// The other rules fix the station when the carrier finishes the previous step. Shortest queue (and
// a pooled decision) breaks ties by the way ahead: it takes the nearest tied station's lane and then
// the furthest tied station on that lane, so a carrier does not stop at the first of two parallel
// positions and hold up the one behind it on its way to the second (carriers cannot pass on a lane).
import { DISPATCH_FIRST_FREE, DISPATCH_POOLED, DISPATCH_ROUND_ROBIN } from './compile';
import { wake } from './lanes';
import type { LineState } from './state';
import { NONE, type CarrierIndex, type IndexArray, type StationIndex, type StepIndex } from './indexes';

const EPS_MM = 1e-6;

/** Which stations a choice may take: all, those reachable without a lap, or those that also have room. */
const ANY = 0;
const REACHABLE = 1;
const WITH_ROOM = 2;

function leastAssigned(m: LineState, stations: IndexArray<StationIndex>): StationIndex {
  let best = stations[0];
  for (let i = 1; i < stations.length; i++) if (m.sAssigned[stations[i]] < m.sAssigned[best]) best = stations[i];
  return best;
}

/** Estimated seconds for the carrier to reach a station from where it stands. */
function travelSeconds(m: LineState, c: CarrierIndex, station: StationIndex): number {
  const line = m.line;
  const lane = m.cLane[c];
  const pos = m.cPos[c];
  const targetLane = line.stationLane[station];
  const v = line.motion.cruiseMmPerS;
  if (targetLane === lane && line.stationPositionMm[station] >= pos - EPS_MM)
    return (line.stationPositionMm[station] - pos) / v;
  return (
    (line.laneLengthMm[lane] - pos) / v +
    line.routes.cost[lane * line.laneCount + targetLane] +
    line.stationPositionMm[station] / v
  );
}

function eligible(m: LineState, c: CarrierIndex, s: StationIndex, filter: number): boolean {
  if (filter === ANY) return true;
  const line = m.line;
  // A station behind the carrier on its own lane is a lap away.
  if (line.stationLane[s] === m.cLane[c] && line.stationPositionMm[s] < m.cPos[c] - EPS_MM) return false;
  return filter === REACHABLE || m.sAssigned[s] < line.stationRoom[s];
}

/** Shortest queue among the eligible stations, ties by the way ahead; -1 when none is eligible. */
function shortestQueueOnTheWay(
  m: LineState,
  stations: IndexArray<StationIndex>,
  c: CarrierIndex,
  filter: number,
): StationIndex {
  if (m.cLane[c] < 0) return leastAssigned(m, stations);
  let least = Infinity;
  for (let i = 0; i < stations.length; i++)
    if (eligible(m, c, stations[i], filter) && m.sAssigned[stations[i]] < least) least = m.sAssigned[stations[i]];
  let nearest: StationIndex = NONE;
  let nearestCost = Infinity;
  for (let i = 0; i < stations.length; i++) {
    const s = stations[i];
    if (m.sAssigned[s] !== least || !eligible(m, c, s, filter)) continue;
    const cost = travelSeconds(m, c, s);
    if (cost < nearestCost) {
      nearest = s;
      nearestCost = cost;
    }
  }
  if (nearest < 0) return NONE;
  const line = m.line;
  const lane = line.stationLane[nearest];
  let chosen = nearest;
  for (let i = 0; i < stations.length; i++) {
    const s = stations[i];
    if (
      m.sAssigned[s] !== least ||
      !eligible(m, c, s, filter) ||
      line.stationLane[s] !== lane ||
      line.stationPositionMm[s] <= line.stationPositionMm[chosen]
    )
      continue;
    // Only a station reached by running on along the same lane, not one a lap later.
    const along =
      nearestCost + (line.stationPositionMm[s] - line.stationPositionMm[nearest]) / line.motion.cruiseMmPerS;
    if (Math.abs(travelSeconds(m, c, s) - along) < 1e-9) chosen = s;
  }
  return chosen;
}

function assign(m: LineState, c: CarrierIndex, station: StationIndex): void {
  m.cPending[c] = 0;
  m.cTarget[c] = station;
  m.sAssigned[station]++;
  m.observer.stationAssigned(station, m.sAssigned[station], m.now);
}

/**
 * Sets the carrier's next station for a step it is now ready for. A pooled step with several
 * stations leaves the carrier pending, heading along the common route (its first station is the
 * route hint).
 */
export function chooseStation(m: LineState, step: StepIndex, c: CarrierIndex): void {
  const stations = m.line.stepStations[step];
  const rule = m.line.stepDispatch[step];
  let chosen: StationIndex;
  if (stations.length === 1) chosen = stations[0];
  else if (rule === DISPATCH_POOLED) {
    m.cPending[c] = 1;
    m.cTarget[c] = stations[0];
    return;
  } else if (rule === DISPATCH_ROUND_ROBIN) {
    chosen = stations[m.stepRoundRobin[step]];
    m.stepRoundRobin[step] = (m.stepRoundRobin[step] + 1) % stations.length;
  } else if (rule === DISPATCH_FIRST_FREE) {
    chosen = NONE;
    for (let i = 0; i < stations.length && chosen < 0; i++) if (m.sAssigned[stations[i]] === 0) chosen = stations[i];
    if (chosen < 0) chosen = leastAssigned(m, stations);
  } else chosen = shortestQueueOnTheWay(m, stations, c, ANY);
  assign(m, c, chosen);
}

/** The next hops from the carrier's lane end to the pending step's stations differ: the routes part here. */
function routesPartAtLaneEnd(m: LineState, c: CarrierIndex, stations: IndexArray<StationIndex>): boolean {
  const line = m.line;
  const from = m.cLane[c] * line.laneCount;
  const first = line.routes.nextHop[from + line.stationLane[stations[0]]];
  for (let i = 1; i < stations.length; i++)
    if (line.routes.nextHop[from + line.stationLane[stations[i]]] !== first) return true;
  return false;
}

/**
 * A pending carrier has reached its stop point: a station of its step on its lane, or the lane end.
 * Decides there if the routes part, and returns false when it must wait for room (it is then woken
 * when a station of the step is released).
 */
export function decidePending(m: LineState, c: CarrierIndex): boolean {
  const step = m.line.stationStep[m.cTarget[c]];
  const stations = m.line.stepStations[step];
  const atLaneEnd = Math.abs(m.cPos[c] - m.line.laneLengthMm[m.cLane[c]]) <= EPS_MM;
  const onOwnLane =
    !atLaneEnd ||
    stations.some(
      (s) => m.line.stationLane[s] === m.cLane[c] && Math.abs(m.line.stationPositionMm[s] - m.cPos[c]) <= EPS_MM,
    );
  if (!onOwnLane && !routesPartAtLaneEnd(m, c, stations)) return true;
  let chosen = shortestQueueOnTheWay(m, stations, c, onOwnLane ? REACHABLE : WITH_ROOM);
  if (chosen < 0 && onOwnLane) chosen = shortestQueueOnTheWay(m, stations, c, ANY);
  if (chosen < 0) {
    m.stepWaiting[step].push(c);
    return false;
  }
  assign(m, c, chosen);
  return true;
}

/** The station's carrier has finished: one fewer in its queue, and carriers waiting for room look again. */
export function unassign(m: LineState, station: StationIndex): void {
  m.sAssigned[station]--;
  m.observer.stationAssigned(station, m.sAssigned[station], m.now);
  const waiting = m.stepWaiting[m.line.stationStep[station]];
  if (waiting.length > 0) {
    for (const c of waiting) wake(m, c);
    waiting.length = 0;
  }
}
