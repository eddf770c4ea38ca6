// A line with an optional shaded interval around it, shared by the time series and the sweep curve.
import { area, line, type ScaleLinear } from 'd3';

interface LineWithBandProps {
  xs: readonly number[];
  values: readonly number[];
  lower?: readonly number[];
  upper?: readonly number[];
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
  colour: string;
  dash?: string;
  name: string;
}

export function LineWithBand({ xs, values, lower, upper, x, y, colour, dash, name }: LineWithBandProps) {
  const indices = xs.map((_, i) => i);
  const band =
    lower && upper
      ? area<number>()
          .x((i) => x(xs[i]))
          .y0((i) => y(lower[i]))
          .y1((i) => y(upper[i]))(indices)
      : null;
  const path = line<number>()
    .x((i) => x(xs[i]))
    .y((i) => y(values[i]))(indices);
  return (
    <g data-series={name} pointerEvents="none">
      {band && <path d={band} fill={colour} fillOpacity={0.18} stroke="none" data-chart-part="band" />}
      <path
        d={path ?? ''}
        fill="none"
        stroke={colour}
        strokeWidth={2}
        strokeDasharray={dash || undefined}
        data-chart-part="line"
      />
    </g>
  );
}

/** Index of the x closest to a pointer value; xs must be ascending. */
export function nearestIndex(xs: readonly number[], value: number): number {
  let lo = 0;
  let hi = xs.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (xs[mid] <= value) lo = mid;
    else hi = mid;
  }
  return Math.abs(xs[hi] - value) < Math.abs(xs[lo] - value) ? hi : lo;
}

export function ascendingProblem(xs: readonly number[], path: string): string | null {
  for (let i = 1; i < xs.length; i++)
    if (!(xs[i] > xs[i - 1]))
      return `${path}[${i}] is ${xs[i]}, not above ${path}[${i - 1}] (${xs[i - 1]}); values must rise`;
  return null;
}
