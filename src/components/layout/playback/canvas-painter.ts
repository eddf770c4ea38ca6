// Draws a computed frame onto the playback's canvases: one canvas laid over each deck's plan and one
// over the side elevation. A canvas costs the browser no style, layout or vector rasterising per
// frame (SVG marks cost all three, about 7 ms of main thread a frame with 50 carriers on three
// decks), and a view whose marks did not change is not drawn again. Canvas sizes are read once and
// on resize only, never inside a frame, so drawing never forces a layout.
import { STATION_STATES, stateColour } from '../../charts/palette';
import { DRAWING, type PlanFrame } from '../drawing-frame';
import type { PlaybackTrace } from '../../../../shared/results/playback';
import type { LayoutModel } from '../layout-model';
import type { Box } from '../geometry';
import { overlayCanvasRegion, overlayCanvasSelector } from '../overlay-canvas';
import { carrierShapePx, SIDE_CARRIER_PX, STATION_RING_PX, stationPlaces, type FrameState } from './frame-state';

interface View {
  canvas: HTMLCanvasElement;
  ctx: CanvasRenderingContext2D;
  /** The part of the view box the canvas covers, px (the drawing's own coordinates). */
  region: Box;
}

export interface CanvasPainter {
  /** Draws the views `frame.changed` marks, or every view when `all`. */
  paint(frame: FrameState, all?: boolean): void;
  dispose(): void;
}

const STATE_COLOURS = STATION_STATES.map((name) => stateColour[name]);

/** Paints on the overlay canvases under `root`: each deck's plan (in `model.decks` order), then the side elevation. */
export function canvasPainter(
  root: HTMLElement,
  model: LayoutModel,
  trace: Pick<PlaybackTrace, 'carrierLengthMm' | 'stationIds'>,
  plan: PlanFrame | null,
): CanvasPainter {
  const views: (View | null)[] = [...model.decks.map((deck) => deck.id), undefined].map((deckId) => {
    const canvas = root.querySelector<HTMLCanvasElement>(overlayCanvasSelector(deckId));
    const ctx = canvas?.getContext('2d');
    if (!canvas || !ctx) return null;
    return { canvas, ctx, region: overlayCanvasRegion(canvas) };
  });
  const side = views.length - 1;
  const shape = plan ? carrierShapePx(model, trace.carrierLengthMm, plan) : null;
  const stationPoints = stationPlaces(model, trace.stationIds, plan);

  const fit = () => {
    const ratio = window.devicePixelRatio || 1;
    for (const view of views) {
      if (!view) continue;
      const box = view.canvas.getBoundingClientRect();
      view.canvas.width = Math.max(1, Math.round(box.width * ratio));
      view.canvas.height = Math.max(1, Math.round(box.height * ratio));
    }
  };

  const carriers = (view: View, frame: FrameState, v: number, loaded: number) => {
    const { ctx } = view;
    ctx.beginPath();
    for (let c = 0; c < frame.deck.length; c++) {
      if (frame.loaded[c] !== loaded) continue;
      if (v === side) {
        if (Number.isNaN(frame.sideX[c])) continue;
        const { lengthPx: l, widthPx: w } = SIDE_CARRIER_PX;
        ctx.rect(frame.sideX[c] - l / 2, frame.sideY[c] - w / 2, l, w);
      } else if (frame.deck[c] === v && shape) {
        const l = frame.across[c] ? shape.widthPx : shape.lengthPx;
        const w = frame.across[c] ? shape.lengthPx : shape.widthPx;
        ctx.rect(frame.x[c] - l / 2, frame.y[c] - w / 2, l, w);
      }
    }
    ctx.fillStyle = loaded ? DRAWING.colour.ink : DRAWING.colour.paper;
    ctx.fill();
    ctx.stroke();
  };

  const rings = (view: View, frame: FrameState, v: number) => {
    const { ctx } = view;
    ctx.lineWidth = STATION_RING_PX.width;
    // One path per state, so a frame sets each colour once whatever the station count.
    for (let state = 0; state < STATE_COLOURS.length; state++) {
      ctx.beginPath();
      let any = false;
      for (let s = 0; s < stationPoints.length; s++) {
        const point = stationPoints[s];
        if (!point || point.deck !== v || frame.stationState[s] !== state) continue;
        ctx.moveTo(point.x + STATION_RING_PX.radius, point.y);
        ctx.arc(point.x, point.y, STATION_RING_PX.radius, 0, 2 * Math.PI);
        any = true;
      }
      if (!any) continue;
      ctx.strokeStyle = STATE_COLOURS[state];
      ctx.stroke();
    }
  };

  const draw = (v: number, frame: FrameState) => {
    const view = views[v];
    if (!view) return;
    const { ctx, canvas } = view;
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, canvas.width, canvas.height);
    const { minX, maxX, minY, maxY } = view.region;
    const sx = canvas.width / (maxX - minX);
    const sy = canvas.height / (maxY - minY);
    ctx.setTransform(sx, 0, 0, sy, -minX * sx, -minY * sy);
    if (v !== side) rings(view, frame, v);
    ctx.lineWidth = 1.5;
    ctx.strokeStyle = DRAWING.colour.ink;
    carriers(view, frame, v, 0);
    carriers(view, frame, v, 1);
  };

  let last: FrameState | null = null;
  const paint = (frame: FrameState, all = false) => {
    last = frame;
    for (let v = 0; v < views.length; v++) if (all || frame.changed[v]) draw(v, frame);
  };
  fit();
  // Setting a canvas's size clears it, so a resize redraws the last frame on every view.
  const observer =
    typeof ResizeObserver === 'undefined'
      ? null
      : new ResizeObserver(() => {
          fit();
          if (last) paint(last, true);
        });
  for (const view of views) if (view) observer?.observe(view.canvas);
  return { paint, dispose: () => observer?.disconnect() };
}
