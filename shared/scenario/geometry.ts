// Plan geometry of a layout: where each lane lies on the floor, and the footprint of the whole
// track (decks stacked above one another share floor space). Used to draw layouts and compare them.
import { laneLengthMm, type Heading, type Lane } from './track';

export type PlanRect = { xMinMm: number; yMinMm: number; xMaxMm: number; yMaxMm: number };

const DIRECTION: Record<Heading, [number, number]> = { east: [1, 0], north: [0, 1], west: [-1, 0], south: [0, -1] };

/** The lane's rectangle in plan: from its start along its heading, centred on its axis. */
export function laneRect(lane: Lane, widthMm: number): PlanRect {
  const [dx, dy] = DIRECTION[lane.heading];
  const length = laneLengthMm(lane);
  const x2 = lane.start.xMm + dx * length;
  const y2 = lane.start.yMm + dy * length;
  const half = widthMm / 2;
  return {
    xMinMm: Math.min(lane.start.xMm, x2) - (dx === 0 ? half : 0),
    xMaxMm: Math.max(lane.start.xMm, x2) + (dx === 0 ? half : 0),
    yMinMm: Math.min(lane.start.yMm, y2) - (dy === 0 ? half : 0),
    yMaxMm: Math.max(lane.start.yMm, y2) + (dy === 0 ? half : 0),
  };
}

/** Bounding rectangle of all lanes in plan, and its area in square metres. */
export function footprint(s: { lanes: Lane[]; track: { widthMm: number } }): PlanRect & { areaM2: number } {
  const rects = s.lanes.map((l) => laneRect(l, s.track.widthMm));
  const box = {
    xMinMm: Math.min(...rects.map((r) => r.xMinMm)),
    yMinMm: Math.min(...rects.map((r) => r.yMinMm)),
    xMaxMm: Math.max(...rects.map((r) => r.xMaxMm)),
    yMaxMm: Math.max(...rects.map((r) => r.yMaxMm)),
  };
  return { ...box, areaM2: ((box.xMaxMm - box.xMinMm) * (box.yMaxMm - box.yMinMm)) / 1e6 };
}
