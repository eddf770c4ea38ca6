// A transparent SVG laid exactly over a drawing, in the same coordinates, for marks that change every
// frame (the playback). Its own compositing layer means the drawing below is not painted again when
// they move.
import type { ReactNode } from 'react';

export function OverlayLayer({
  widthPx,
  heightPx,
  children,
}: {
  widthPx: number;
  heightPx: number;
  children: ReactNode;
}) {
  return (
    <svg
      viewBox={`0 0 ${widthPx} ${heightPx}`}
      className="pointer-events-none absolute inset-0 h-full w-full"
      style={{ willChange: 'transform' }}
      aria-hidden="true"
      data-drawing-overlay
    >
      {children}
    </svg>
  );
}
