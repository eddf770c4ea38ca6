// One moment of a playback as flat typed arrays: for every carrier the view it shows on, its centre
// in that view's pixels, its heading (along or across the page) and whether it carries a part; for
// every station its state. Computed once per animation frame into arrays allocated once, so the
// painter and the text summary read the same numbers and a frame allocates nothing.
import type { PlanFrame } from '../drawing-frame';
import type { ElevationFrame } from '../elevation-view';
import type { LayoutModel } from '../layout-model';
import { carrierPlacer, elevationPoint, type DrawnPlace } from './carrier-places';
import { carrierAt, stationStateAt, type CarrierPlace, type TraceIndex } from './trace-index';

/** Where a carrier is, for the text summary: on a lane, in a connection, or not known yet. */
export const PLACE_UNKNOWN = 0;
export const PLACE_LANE = 1;
export const PLACE_CONNECTION = 2;

export interface FrameState {
  t: number;
  /** Per carrier: index of the deck (in `model.decks`) whose plan shows it, or -1. */
  deck: Int16Array;
  /** Per carrier: centre on that plan, px of the drawing's view box. */
  x: Float32Array;
  y: Float32Array;
  /** Per carrier: 1 when it runs up or down the page (north or south), so its shape is turned. */
  across: Uint8Array;
  /** Per carrier: centre in the side elevation, px; NaN when there is no side elevation. */
  sideX: Float32Array;
  sideY: Float32Array;
  loaded: Uint8Array;
  /** Per carrier: PLACE_* and, for a lane or connection, its index and (on a lane) the front's position. */
  placeKind: Uint8Array;
  placeIndex: Int32Array;
  posMm: Float32Array;
  /** Per carrier: 1 while a recorded move or a transfer is under way. */
  moving: Uint8Array;
  /** Per station (trace order): state index in STATION_STATES order, or -1 while unknown. */
  stationState: Int8Array;
  /**
   * Per view (decks in `model.decks` order, then the side elevation): 1 when something drawn there
   * differs from the previous frame, so an unchanged view is not drawn again.
   */
  changed: Uint8Array;
}

export interface FrameComputer {
  readonly frame: FrameState;
  /** The side elevation's view index in `frame.changed`. */
  readonly sideView: number;
  compute(t: number): FrameState;
}

export function frameComputer(
  model: LayoutModel,
  index: TraceIndex,
  plan: PlanFrame | null,
  elevation: ElevationFrame | null,
): FrameComputer {
  const { trace } = index;
  const n = trace.carrierCount;
  const placer = carrierPlacer(model, trace);
  const deckIndex = new Map(model.decks.map((deck, i) => [deck.id, i]));
  const sideView = model.decks.length;
  const frame: FrameState = {
    t: Number.NaN,
    deck: new Int16Array(n).fill(-1),
    x: new Float32Array(n),
    y: new Float32Array(n),
    across: new Uint8Array(n),
    sideX: new Float32Array(n).fill(Number.NaN),
    sideY: new Float32Array(n).fill(Number.NaN),
    loaded: new Uint8Array(n),
    placeKind: new Uint8Array(n),
    placeIndex: new Int32Array(n),
    posMm: new Float32Array(n),
    moving: new Uint8Array(n),
    stationState: new Int8Array(trace.stationIds.length).fill(-1),
    changed: new Uint8Array(sideView + 1).fill(1),
  };
  const stationDeck = stationPlaces(model, trace.stationIds, plan).map((place) => place?.deck ?? -1);
  const at: CarrierPlace = { lane: -1, posMm: 0, conn: -1, fraction: 0, loaded: false, moving: false };
  const drawn: DrawnPlace = { deckId: '', x: 0, y: 0, angle: 0, elevationMm: 0 };
  // A tenth of a pixel: finer changes are invisible, and rounding keeps float noise from redrawing.
  const moved = (a: number, b: number) => Math.abs(a - b) >= 0.1 || Number.isNaN(a) !== Number.isNaN(b);

  return {
    frame,
    sideView,
    compute(t) {
      frame.t = t;
      frame.changed.fill(0);
      for (let c = 0; c < n; c++) {
        const known = carrierAt(index, c, t, at) && placer.place(at, drawn);
        const deck = known && plan ? (deckIndex.get(drawn.deckId) ?? -1) : -1;
        const x = deck >= 0 && plan ? plan.x(drawn.x) : 0;
        const y = deck >= 0 && plan ? plan.y(drawn.y) : 0;
        const loaded = at.loaded ? 1 : 0;
        const across = drawn.angle === 90 || drawn.angle === -90 ? 1 : 0;
        if (frame.deck[c] !== deck || moved(frame.x[c], x) || moved(frame.y[c], y) || frame.loaded[c] !== loaded) {
          if (frame.deck[c] >= 0) frame.changed[frame.deck[c]] = 1;
          if (deck >= 0) frame.changed[deck] = 1;
        }
        const side = known && elevation ? elevationPoint(elevation, drawn) : null;
        const sideX = side ? side.x : Number.NaN;
        const sideY = side ? side.y - SIDE_CARRIER_PX.abovePx : Number.NaN;
        if (moved(frame.sideX[c], sideX) || moved(frame.sideY[c], sideY) || frame.loaded[c] !== loaded)
          frame.changed[sideView] = 1;
        frame.deck[c] = deck;
        frame.x[c] = x;
        frame.y[c] = y;
        frame.across[c] = across;
        frame.sideX[c] = sideX;
        frame.sideY[c] = sideY;
        frame.loaded[c] = loaded;
        frame.placeKind[c] = !known ? PLACE_UNKNOWN : at.lane >= 0 ? PLACE_LANE : PLACE_CONNECTION;
        frame.placeIndex[c] = at.lane >= 0 ? at.lane : at.conn;
        frame.posMm[c] = at.posMm;
        frame.moving[c] = known && at.moving ? 1 : 0;
      }
      for (let s = 0; s < frame.stationState.length; s++) {
        const state = stationStateAt(index, s, t);
        if (state !== frame.stationState[s] && stationDeck[s] >= 0) frame.changed[stationDeck[s]] = 1;
        frame.stationState[s] = state;
      }
      return frame;
    },
  };
}

/** The plan's carrier shape in px: length along the lane and width across, never too small to see. */
export function carrierShapePx(model: LayoutModel, carrierLengthMm: number, plan: PlanFrame) {
  return {
    lengthPx: Math.max(carrierLengthMm * plan.scale, 5),
    widthPx: Math.max(model.widthMm * plan.scale * 0.75, 6),
  };
}

/** Size of the side elevation's carrier shape, px, and how far above its deck line it rides. */
export const SIDE_CARRIER_PX = { lengthPx: 8, widthPx: 6, abovePx: 7 } as const;

/** The station ring's radius and line width, px: round the station marker, outside its label. */
export const STATION_RING_PX = { radius: 11, width: 4 } as const;

/** How far the playback's marks reach beyond the track, px: the overlay canvases cover that much more. */
export function overlayMarginPx(model: LayoutModel, carrierLengthMm: number, plan: PlanFrame | null): number {
  const shape = plan ? carrierShapePx(model, carrierLengthMm, plan) : { lengthPx: 0, widthPx: 0 };
  const reach = [
    Math.max(shape.lengthPx, shape.widthPx) / 2,
    STATION_RING_PX.radius + STATION_RING_PX.width / 2,
    SIDE_CARRIER_PX.abovePx + SIDE_CARRIER_PX.widthPx / 2,
  ];
  // Two more pixels for the outline's stroke and for rounding.
  return Math.ceil(Math.max(...reach)) + 2;
}

/** Per station (trace order): its deck's index in `model.decks` and its centre on the plan, px; null when not drawn. */
export function stationPlaces(model: LayoutModel, stationIds: readonly string[], plan: PlanFrame | null) {
  const deckIndex = new Map(model.decks.map((deck, i) => [deck.id, i]));
  const byId = new Map(model.stations.map((station) => [station.id, station]));
  return stationIds.map((id) => {
    const station = byId.get(id);
    const deck = station ? deckIndex.get(station.deckId) : undefined;
    return station && plan && deck !== undefined
      ? { deck, x: plan.x(station.point.x), y: plan.y(station.point.y) }
      : null;
  });
}
