// Settings of a sweep that have no result because the run stopped or was not valid (a gridlock, too
// many carriers for the track): a cross on the setting axis, so a gap in the curve is never read as
// a measured zero.
import type { ScaleLinear } from 'd3';

export interface StopMark {
  x: number;
  /** Why the setting has no result, for the tooltip-free reader: e.g. "gridlock". */
  reason: string;
}

export const STOP_COLOUR = '#6b6b6b';

export function StopMarks({
  marks,
  x,
  plotHeight,
  colour = STOP_COLOUR,
}: {
  marks: readonly StopMark[];
  x: ScaleLinear<number, number>;
  plotHeight: number;
  colour?: string;
}) {
  return (
    <g pointerEvents="none" data-chart-part="stops">
      {marks.map((m) => (
        <g key={m.x} transform={`translate(${x(m.x)},${plotHeight - 8})`} data-chart-part="stop">
          <title>{`${m.x}: ${m.reason}`}</title>
          <path d="M-5,-5 L5,5 M-5,5 L5,-5" stroke={colour} strokeWidth={2.5} />
        </g>
      ))}
    </g>
  );
}
