// One scale for every deck's plan, so lanes on different decks line up and can be compared by eye.
import type { Box } from './geometry';

export const DRAWING = {
  widthPx: 960,
  padPx: 56,
  /** A very long, thin line would otherwise be drawn a few pixels high. */
  minPlanHeightPx: 150,
  maxPlanHeightPx: 420,
  colour: {
    ink: '#1d2430',
    inkSoft: '#4a5568',
    faint: '#8a94a6',
    lane: '#e3e1d8',
    paper: '#ffffff',
    accent: '#0f766e',
    accentSoft: '#ccfbf1',
    join: '#6b4fa0',
  },
} as const;

export interface PlanFrame {
  /** Pixels per millimetre. */
  scale: number;
  heightPx: number;
  x: (mm: number) => number;
  y: (mm: number) => number;
}

export function planFrame(box: Box): PlanFrame {
  const spanX = Math.max(box.maxX - box.minX, 1);
  const spanY = Math.max(box.maxY - box.minY, 1);
  const usableWidth = DRAWING.widthPx - 2 * DRAWING.padPx;
  const scale = Math.min(usableWidth / spanX, (DRAWING.maxPlanHeightPx - 2 * DRAWING.padPx) / spanY);
  const heightPx = Math.max(DRAWING.minPlanHeightPx, spanY * scale + 2 * DRAWING.padPx);
  const offsetX = DRAWING.padPx + (usableWidth - spanX * scale) / 2;
  const offsetY = (heightPx - spanY * scale) / 2;
  return {
    scale,
    heightPx,
    x: (mm) => offsetX + (mm - box.minX) * scale,
    // North is up on paper; SVG counts downwards.
    y: (mm) => offsetY + (box.maxY - mm) * scale,
  };
}

/** A round length (1, 2 or 5 times a power of ten) near a fifth of the span, for the scale bar. */
export function scaleBarLengthMm(spanMm: number): number {
  const target = Math.max(spanMm / 5, 1);
  const power = 10 ** Math.floor(Math.log10(target));
  const steps = [1, 2, 5, 10];
  return (steps.find((s) => s * power >= target) ?? 10) * power;
}

/** Labels near either edge grow inwards, so they are never cut off by the drawing's border. */
export function anchorFor(xPx: number, widthPx: number = DRAWING.widthPx): 'start' | 'middle' | 'end' {
  if (xPx > widthPx - 120) return 'end';
  if (xPx < 120) return 'start';
  return 'middle';
}
