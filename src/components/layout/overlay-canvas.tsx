// A transparent canvas laid over one view of the drawing (a deck's plan, or the side elevation), for
// marks that change every frame (the playback). It covers only the region where marks can be (the
// track plus a margin), because in software compositing every frame copies and blends the whole
// canvas. It carries the view-box region it covers, so whoever draws on it uses the drawing's own
// coordinates. Screen readers skip it: the playback says in text what it shows.
import type { Box } from './geometry';

export interface OverlaySpec {
  /** How far marks reach beyond the track, view-box px (half a carrier, or a station ring). */
  marginPx: number;
}

/** The region `box` (view-box px) grown by `marginPx` and kept inside the view. */
export function overlayRegion(box: Box, marginPx: number, widthPx: number, heightPx: number): Box {
  return {
    minX: Math.max(0, Math.floor(box.minX - marginPx)),
    maxX: Math.min(widthPx, Math.ceil(box.maxX + marginPx)),
    minY: Math.max(0, Math.floor(box.minY - marginPx)),
    maxY: Math.min(heightPx, Math.ceil(box.maxY + marginPx)),
  };
}

const percent = (part: number, whole: number) => `${(part / whole) * 100}%`;

export function OverlayCanvas({
  widthPx,
  heightPx,
  region,
  deckId,
}: {
  widthPx: number;
  heightPx: number;
  region: Box;
  deckId?: string;
}) {
  return (
    <canvas
      className="pointer-events-none absolute"
      style={{
        left: percent(region.minX, widthPx),
        top: percent(region.minY, heightPx),
        width: percent(region.maxX - region.minX, widthPx),
        height: percent(region.maxY - region.minY, heightPx),
      }}
      aria-hidden="true"
      data-region={[region.minX, region.minY, region.maxX, region.maxY].join(' ')}
      data-overlay-deck={deckId}
      data-overlay-side={deckId === undefined ? '' : undefined}
    />
  );
}

/** The overlay canvas of a deck's plan, or of the side elevation when `deckId` is undefined. */
export function overlayCanvasSelector(deckId?: string): string {
  return deckId === undefined ? 'canvas[data-overlay-side]' : `canvas[data-overlay-deck="${CSS.escape(deckId)}"]`;
}

/** The region an overlay canvas covers, view-box px, as written by OverlayCanvas. */
export function overlayCanvasRegion(canvas: HTMLCanvasElement): Box {
  const [minX, minY, maxX, maxY] = (canvas.dataset.region ?? '0 0 1 1').split(' ').map(Number);
  return { minX, minY, maxX, maxY };
}
