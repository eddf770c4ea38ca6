// SVG fill patterns that mark things by texture as well as colour (over takt, warm-up).
import { useId } from 'react';

/** A unique, CSS-safe id for a pattern or gradient in this chart. */
export function useSvgId(prefix: string): string {
  return `${prefix}-${useId().replace(/[^a-zA-Z0-9_-]/g, '')}`;
}

export function HatchPattern({
  id,
  colour,
  background = 'none',
  spacing = 6,
}: {
  id: string;
  colour: string;
  background?: string;
  spacing?: number;
}) {
  return (
    <pattern id={id} patternUnits="userSpaceOnUse" width={spacing} height={spacing} patternTransform="rotate(45)">
      <rect width={spacing} height={spacing} fill={background} />
      <line x1={0} y1={0} x2={0} y2={spacing} stroke={colour} strokeWidth={spacing / 3} />
    </pattern>
  );
}
