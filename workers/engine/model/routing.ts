// Next-hop routing over the directed track graph. Lanes are nodes; each link or transfer is an edge
// from the end of one lane to the start of another. A carrier at the end of lane x heading for a
// station on lane y leaves by nextHop[x * laneCount + y], the first edge of the quickest route
// (estimated from lane lengths at top speed and transfer cycle times). Computed once per scenario
// (Floyd–Warshall, fine for the few hundred lanes a layout has), so the hot path only reads a table.
import { indexArray, type ConnIndex, type IndexArray } from './indexes';

export type TrackGraph = {
  laneCount: number;
  laneTraverseSeconds: Float64Array;
  connFrom: Int32Array;
  connTo: Int32Array;
  connSeconds: Float64Array;
};

export type Routes = {
  /** Connection to leave lane x by to reach lane y, or -1 when y cannot be reached from x's end. */
  nextHop: IndexArray<ConnIndex>;
  /** Estimated seconds from the end of lane x to the start of lane y (Infinity: unreachable). */
  cost: Float64Array;
};

export function computeRoutes(g: TrackGraph): Routes {
  const n = g.laneCount;
  // through[x][y]: quickest time from the end of x to the end of y (traversing y).
  const through = new Float64Array(n * n).fill(Infinity);
  for (let c = 0; c < g.connFrom.length; c++) {
    const x = g.connFrom[c];
    const y = g.connTo[c];
    const w = g.connSeconds[c] + g.laneTraverseSeconds[y];
    if (w < through[x * n + y]) through[x * n + y] = w;
  }
  for (let k = 0; k < n; k++) {
    for (let i = 0; i < n; i++) {
      const ik = through[i * n + k];
      if (ik === Infinity) continue;
      for (let j = 0; j < n; j++) {
        const v = ik + through[k * n + j];
        if (v < through[i * n + j]) through[i * n + j] = v;
      }
    }
  }
  const nextHop = indexArray<ConnIndex>(n * n);
  const cost = new Float64Array(n * n).fill(Infinity);
  for (let x = 0; x < n; x++) {
    for (let y = 0; y < n; y++) {
      for (let c = 0; c < g.connFrom.length; c++) {
        if (g.connFrom[c] !== x) continue;
        const z = g.connTo[c];
        const rest = z === y ? 0 : through[z * n + y] - g.laneTraverseSeconds[y] + g.laneTraverseSeconds[z];
        const v = g.connSeconds[c] + rest;
        if (v < cost[x * n + y]) {
          cost[x * n + y] = v;
          nextHop[x * n + y] = c as ConnIndex;
        }
      }
    }
  }
  return { nextHop, cost };
}
