// Plan geometry of a layout, computed from a scenario document that may still be a draft: lanes
// whose numbers are missing or not finite are left out instead of breaking the drawing. Headings
// are the four compass directions, so every lane is an axis-aligned strip in plan.
import { laneLengthMm, laneModuleCount, type Heading } from '../../../shared/scenario/track';

/** The parts of a (draft) document the drawing reads; every field may be missing while typing. */
export interface DraftLane {
  id?: string;
  name?: string;
  deckId?: string;
  modules?: ({ lengthMm?: unknown; count?: unknown } | undefined)[];
  start?: { xMm?: unknown; yMm?: unknown };
  heading?: string;
}

export interface PlanLane {
  index: number;
  id: string;
  name: string;
  deckId: string;
  heading: Heading;
  lengthMm: number;
  moduleCount: number;
  start: { x: number; y: number };
  end: { x: number; y: number };
  /** Distances from the start at which one module meets the next. */
  jointsMm: number[];
  box: Box;
}

export interface Box {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

export interface Footprint {
  /** The longer side of the smallest axis-aligned rectangle round every lane, in mm. */
  lengthMm: number;
  /** The shorter side, in mm. */
  widthMm: number;
  areaM2: number;
  box: Box;
}

const DIRECTIONS: Record<Heading, { dx: number; dy: number }> = {
  east: { dx: 1, dy: 0 },
  north: { dx: 0, dy: 1 },
  west: { dx: -1, dy: 0 },
  south: { dx: 0, dy: -1 },
};

const finite = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);
const isHeading = (v: unknown): v is Heading => typeof v === 'string' && v in DIRECTIONS;

export function directionOf(heading: Heading): { dx: number; dy: number } {
  return DIRECTIONS[heading];
}

/** A point `distanceMm` along a lane from its start. */
export function pointAlong(lane: Pick<PlanLane, 'start' | 'heading'>, distanceMm: number): { x: number; y: number } {
  const { dx, dy } = DIRECTIONS[lane.heading];
  return { x: lane.start.x + dx * distanceMm, y: lane.start.y + dy * distanceMm };
}

/** The lane as drawn, or null while its numbers are incomplete. */
export function planLane(lane: DraftLane, index: number, widthMm: number): PlanLane | null {
  if (!lane.start || !finite(lane.start.xMm) || !finite(lane.start.yMm) || !isHeading(lane.heading)) return null;
  const modules: { lengthMm: number; count: number }[] = [];
  for (const module of lane.modules ?? []) {
    if (!module || !finite(module.lengthMm) || !finite(module.count) || module.lengthMm <= 0 || module.count < 1)
      return null;
    modules.push({ lengthMm: module.lengthMm, count: module.count });
  }
  const lengthMm = laneLengthMm({ modules });
  const moduleCount = laneModuleCount({ modules });
  if (lengthMm <= 0) return null;
  const jointsMm: number[] = [];
  let along = 0;
  // Joints stop being legible long before this many; the cap keeps a typo like 1e9 modules from hanging the page.
  for (const module of modules) {
    for (let i = 0; i < module.count && jointsMm.length < 2000; i += 1) {
      along += module.lengthMm;
      if (along < lengthMm) jointsMm.push(along);
    }
  }
  const start = { x: lane.start.xMm, y: lane.start.yMm };
  const heading = lane.heading;
  const end = pointAlong({ start, heading }, lengthMm);
  const half = widthMm / 2;
  const alongX = DIRECTIONS[heading].dx !== 0;
  const box: Box = {
    minX: Math.min(start.x, end.x) - (alongX ? 0 : half),
    maxX: Math.max(start.x, end.x) + (alongX ? 0 : half),
    minY: Math.min(start.y, end.y) - (alongX ? half : 0),
    maxY: Math.max(start.y, end.y) + (alongX ? half : 0),
  };
  return {
    index,
    id: lane.id ?? `lane ${index + 1}`,
    name: lane.name ?? '',
    deckId: lane.deckId ?? '',
    heading,
    lengthMm,
    moduleCount,
    start,
    end,
    jointsMm,
    box,
  };
}

export function planLanes(lanes: readonly (DraftLane | undefined)[] | undefined, widthMm: unknown): PlanLane[] {
  const width = finite(widthMm) && widthMm > 0 ? widthMm : 0;
  return (lanes ?? []).flatMap((lane, index) => {
    const drawn = lane ? planLane(lane, index, width) : null;
    return drawn ? [drawn] : [];
  });
}

export function unionBox(boxes: readonly Box[]): Box | null {
  if (boxes.length === 0) return null;
  return boxes.reduce((a, b) => ({
    minX: Math.min(a.minX, b.minX),
    maxX: Math.max(a.maxX, b.maxX),
    minY: Math.min(a.minY, b.minY),
    maxY: Math.max(a.maxY, b.maxY),
  }));
}

/** Floor area the track covers in plan: decks stacked above each other share it. */
export function footprint(lanes: readonly PlanLane[]): Footprint | null {
  const box = unionBox(lanes.map((lane) => lane.box));
  if (!box) return null;
  const spanX = box.maxX - box.minX;
  const spanY = box.maxY - box.minY;
  return { lengthMm: Math.max(spanX, spanY), widthMm: Math.min(spanX, spanY), areaM2: (spanX * spanY) / 1e6, box };
}
