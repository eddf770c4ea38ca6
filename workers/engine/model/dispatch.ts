// Picks which of a step's stations a carrier is sent to, when it becomes ready for that step.
// A station's queue is the carriers assigned to it: at it or on their way.
import { DISPATCH_FIRST_FREE, DISPATCH_ROUND_ROBIN } from './compile';
import type { LineState } from './state';

function leastAssigned(m: LineState, stations: Int32Array): number {
  let best = stations[0];
  for (let i = 1; i < stations.length; i++) if (m.sAssigned[stations[i]] < m.sAssigned[best]) best = stations[i];
  return best;
}

export function chooseStation(m: LineState, step: number): number {
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
  } else chosen = leastAssigned(m, stations);
  m.sAssigned[chosen]++;
  m.observer.stationAssigned(chosen, m.sAssigned[chosen], m.now);
  return chosen;
}

export function unassign(m: LineState, station: number): void {
  m.sAssigned[station]--;
  m.observer.stationAssigned(station, m.sAssigned[station], m.now);
}
