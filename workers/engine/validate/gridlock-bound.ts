// The most carriers a layout can run without ever gridlocking. A gridlock is a closed loop of waits:
// the carrier at each lane end waits for room at the start of the next lane (directly or through a
// transfer holding a carrier), and that lane's carriers stand nose to tail back to its start, so every
// lane of the loop is full and every transfer in it holds one carrier. Stations always finish their
// work and lanes close up behind the carrier ahead, so nothing else can stop the line for good. With
// fewer carriers than the smallest loop of lanes and transfers holds, no loop can fill: the count is
// that loop's capacity less one (and never more than the whole track holds).
import type { Scenario } from '../../../shared/scenario/scenario';
import { laneSlots, trackCapacity } from './static-checks';

/** Carriers the smallest closed loop of lanes, links and transfers holds, or Infinity without a loop. */
export function smallestLoopCapacity(s: Scenario): number {
  const index = new Map(s.lanes.map((l, i) => [l.id, i]));
  const slots = s.lanes.map((lane) => laneSlots(s, lane));
  const n = s.lanes.length;
  // Entering lane v costs its slots, plus one for a transfer on the way; a loop's cost is what it holds.
  const dist = Array.from({ length: n }, () => new Array<number>(n).fill(Infinity));
  const hop = (from: string, to: string, extra: number) => {
    const u = index.get(from);
    const v = index.get(to);
    if (u === undefined || v === undefined) return;
    dist[u][v] = Math.min(dist[u][v], slots[v] + extra);
  };
  for (const link of s.links) hop(link.fromLaneId, link.toLaneId, 0);
  for (const transfer of s.transfers) hop(transfer.fromLaneId, transfer.toLaneId, 1);
  // Floyd–Warshall: afterwards dist[u][u] is the cheapest loop through lane u (Cormen et al.,
  // Introduction to Algorithms, 3rd ed. 2009, §25.2).
  for (let k = 0; k < n; k++)
    for (let i = 0; i < n; i++)
      for (let j = 0; j < n; j++) if (dist[i][k] + dist[k][j] < dist[i][j]) dist[i][j] = dist[i][k] + dist[k][j];
  let smallest = Infinity;
  for (let u = 0; u < n; u++) smallest = Math.min(smallest, dist[u][u]);
  return smallest;
}

export function gridlockFreeCarriers(s: Scenario): number {
  return Math.max(0, Math.min(trackCapacity(s), smallestLoopCapacity(s) - 1));
}
