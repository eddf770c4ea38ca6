// Where a carrier is drawn: on a deck's plan (its centre and heading) and in the side elevation. A
// carrier in an elevator shows on the deck it left for the first half of the lift and on the deck it
// goes to for the second; the side elevation shows it rising or falling between the decks.
import { pointAlong, type PlanLane } from '../geometry';
import type { ElevationFrame } from '../elevation-view';
import type { LayoutModel } from '../layout-model';
import type { PlaybackTrace } from '../../../../shared/results/playback';
import type { CarrierPlace } from './trace-index';

export interface DrawnPlace {
  deckId: string;
  /** Centre of the carrier in plan, mm. */
  x: number;
  y: number;
  /** Screen angle in degrees (plan north is screen up). */
  angle: number;
  /** Height in the side elevation, mm above the floor. */
  elevationMm: number;
}

const ANGLE = { east: 0, north: -90, west: 180, south: 90 } as const;

export interface CarrierPlacer {
  place(at: CarrierPlace, out: DrawnPlace): boolean;
}

export function carrierPlacer(
  model: LayoutModel,
  trace: Pick<PlaybackTrace, 'connFrom' | 'connTo' | 'connKind' | 'carrierLengthMm'>,
): CarrierPlacer {
  const lanes: (PlanLane | undefined)[] = [];
  for (const lane of model.lanes) lanes[lane.index] = lane;
  const elevation = new Map(model.decks.map((d) => [d.id, d.elevationMm ?? 0]));
  const half = trace.carrierLengthMm / 2;
  const onLane = (lane: PlanLane, posMm: number, out: DrawnPlace) => {
    const p = pointAlong(lane, Math.max(posMm - half, 0));
    out.deckId = lane.deckId;
    out.x = p.x;
    out.y = p.y;
    out.angle = ANGLE[lane.heading];
    out.elevationMm = elevation.get(lane.deckId) ?? 0;
  };
  return {
    place(at, out) {
      if (at.lane >= 0) {
        const lane = lanes[at.lane];
        if (!lane) return false;
        onLane(lane, at.posMm, out);
        return true;
      }
      const from = lanes[trace.connFrom[at.conn]];
      const to = lanes[trace.connTo[at.conn]];
      if (!from || !to) return false;
      const f = at.fraction;
      const lift = trace.connKind[at.conn] === 'elevator';
      const lower = elevation.get(from.deckId) ?? 0;
      const upper = elevation.get(to.deckId) ?? 0;
      out.deckId = lift ? (f < 0.5 ? from.deckId : to.deckId) : from.deckId;
      out.x = from.end.x + (to.start.x - from.end.x) * f;
      out.y = from.end.y + (to.start.y - from.end.y) * f;
      out.angle = ANGLE[f < 0.5 ? from.heading : to.heading];
      out.elevationMm = lower + (upper - lower) * f;
      return true;
    },
  };
}

/** Side-elevation position in px of a drawn place. */
export function elevationPoint(frame: ElevationFrame, p: DrawnPlace): { x: number; y: number } {
  return { x: frame.along(p), y: frame.height(p.elevationMm) };
}
