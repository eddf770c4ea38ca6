// Picks which of a step's stations a carrier is sent to, when it becomes ready for that step.
// A station's queue is the carriers assigned to it: at it or on their way. Shortest queue breaks ties
// by the way ahead: it takes the nearest tied station's lane and then the furthest tied station on
// that lane, so a carrier does not stop at the first of two parallel positions and hold up the one
// behind it on its way to the second (carriers cannot pass on a lane).
import { DISPATCH_FIRST_FREE, DISPATCH_ROUND_ROBIN } from './compile';
import type { LineState } from './state';

function leastAssigned(m: LineState, stations: Int32Array): number {
  let best = stations[0];
  for (let i = 1; i < stations.length; i++) if (m.sAssigned[stations[i]] < m.sAssigned[best]) best = stations[i];
  return best;
}

/** Estimated seconds for the carrier to reach a station from where it stands. */
function travelSeconds(m: LineState, c: number, station: number): number {
  const line = m.line;
  const lane = m.cLane[c];
  const pos = m.cPos[c];
  const targetLane = line.stationLane[station];
  const v = line.motion.cruiseMmPerS;
  if (targetLane === lane && line.stationPositionMm[station] >= pos) return (line.stationPositionMm[station] - pos) / v;
  return (line.laneLengthMm[lane] - pos) / v + line.routes.cost[lane * line.laneCount + targetLane] + line.stationPositionMm[station] / v;
}

function shortestQueueOnTheWay(m: LineState, stations: Int32Array, c: number): number {
  const least = m.sAssigned[leastAssigned(m, stations)];
  if (m.cLane[c] < 0) return leastAssigned(m, stations);
  let nearest = -1;
  let nearestCost = Infinity;
  for (let i = 0; i < stations.length; i++) {
    const s = stations[i];
    if (m.sAssigned[s] !== least) continue;
    const cost = travelSeconds(m, c, s);
    if (cost < nearestCost) {
      nearest = s;
      nearestCost = cost;
    }
  }
  const line = m.line;
  const lane = line.stationLane[nearest];
  let chosen = nearest;
  for (let i = 0; i < stations.length; i++) {
    const s = stations[i];
    if (m.sAssigned[s] !== least || line.stationLane[s] !== lane || line.stationPositionMm[s] <= line.stationPositionMm[chosen]) continue;
    // Only a station reached by running on along the same lane, not one a lap later.
    const along = nearestCost + (line.stationPositionMm[s] - line.stationPositionMm[nearest]) / line.motion.cruiseMmPerS;
    if (Math.abs(travelSeconds(m, c, s) - along) < 1e-9) chosen = s;
  }
  return chosen;
}

export function chooseStation(m: LineState, step: number, c: number): number {
  const stations = m.line.stepStations[step];
  let chosen: number;
  if (stations.length === 1) chosen = stations[0];
  else if (m.line.stepDispatch[step] === DISPATCH_ROUND_ROBIN) {
    chosen = stations[m.stepRoundRobin[step]];
    m.stepRoundRobin[step] = (m.stepRoundRobin[step] + 1) % stations.length;
  } else if (m.line.stepDispatch[step] === DISPATCH_FIRST_FREE) {
    chosen = -1;
    for (let i = 0; i < stations.length && chosen < 0; i++) if (m.sAssigned[stations[i]] === 0) chosen = stations[i];
    if (chosen < 0) chosen = leastAssigned(m, stations);
  } else chosen = shortestQueueOnTheWay(m, stations, c);
  m.sAssigned[chosen]++;
  m.observer.stationAssigned(chosen, m.sAssigned[chosen], m.now);
  return chosen;
}

export function unassign(m: LineState, station: number): void {
  m.sAssigned[station]--;
  m.observer.stationAssigned(station, m.sAssigned[station], m.now);
}
