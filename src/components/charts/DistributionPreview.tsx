// A sparkline-sized picture of a cycle-time distribution's shape, for tables and forms. Too small
// for axes: its extent and mean are spoken in the aria label and shown in the native tooltip.
import { area, extent, scaleLinear } from 'd3';
import { useMemo } from 'react';
import { gaussianKde, sampleCurve } from './density';
import { formatNumber } from './format';
import { accent, ink } from './palette';
import { checkNumbers, checkPositive, firstProblem } from './validate';

export interface DistributionPreviewProps {
  /** What the distribution describes, e.g. "Cycle time of Press 1". */
  label: string;
  /** Measured or drawn samples; their shape is estimated with a Gaussian kernel. */
  samples?: readonly number[];
  /** Or a density function, drawn over `domain`. */
  density?: (x: number) => number;
  domain?: readonly [number, number];
  unit?: string;
  width?: number;
  height?: number;
}

interface Shape {
  points: Array<[number, number]>;
  lo: number;
  hi: number;
  mean: number;
}

/** A sparkline cannot show more detail than a few thousand evenly spread order statistics carry. */
const PREVIEW_SAMPLES = 4000;

function thinned(samples: readonly number[]): readonly number[] {
  if (samples.length <= PREVIEW_SAMPLES) return samples;
  const sorted = [...samples].sort((a, b) => a - b);
  return Array.from(
    { length: PREVIEW_SAMPLES },
    (_, i) => sorted[Math.floor(((i + 0.5) * sorted.length) / PREVIEW_SAMPLES)],
  );
}

function shapeOf(props: DistributionPreviewProps): Shape | string | null {
  const { samples, density, domain } = props;
  if (samples) {
    const problem = checkNumbers(samples, 'samples');
    if (problem) return problem;
    if (samples.length === 0) return null;
    // d3's extent rather than Math.min(...): an empirical study may hold 100 000 samples.
    const [lo, hi] = extent(samples) as [number, number];
    const mean = samples.reduce((a, b) => a + b, 0) / samples.length;
    if (lo === hi) return { points: [[lo, 1]], lo, hi, mean };
    const kde = gaussianKde(thinned(samples));
    const pad = (hi - lo) * 0.1;
    return { points: sampleCurve(kde, lo - pad, hi + pad, 60), lo, hi, mean };
  }
  if (density) {
    if (!domain) return 'domain is needed to draw a density function';
    const problem = firstProblem(
      () => checkNumbers(domain, 'domain'),
      () => checkPositive(domain[1] - domain[0], 'domain[1] − domain[0]'),
    );
    if (problem) return problem;
    const points = sampleCurve(density, domain[0], domain[1], 80);
    const mass = points.reduce((sum, [, d]) => sum + d, 0);
    const mean = mass > 0 ? points.reduce((sum, [x, d]) => sum + x * d, 0) / mass : (domain[0] + domain[1]) / 2;
    return { points, lo: domain[0], hi: domain[1], mean };
  }
  return null;
}

export function DistributionPreview(props: DistributionPreviewProps) {
  const { label, unit = 's', width = 120, height = 32 } = props;
  const shape = useMemo(() => shapeOf(props), [props]);
  if (typeof shape === 'string') {
    return (
      <span role="alert" className="text-xs text-danger">
        {label}: cannot draw the shape, {shape}.
      </span>
    );
  }
  if (!shape) {
    return (
      <span
        role="img"
        aria-label={`${label}: no data`}
        className="inline-block text-xs text-ink-faint"
        style={{ width }}
      >
        no data
      </span>
    );
  }
  const description = `${label}: from ${formatNumber(shape.lo)} to ${formatNumber(shape.hi)} ${unit}, mean ${formatNumber(shape.mean)} ${unit}`;
  const xs = shape.points.map(([v]) => v);
  const x = scaleLinear()
    .domain([Math.min(...xs), Math.max(...xs)])
    .range([2, width - 2]);
  const top = Math.max(...shape.points.map(([, d]) => d)) || 1;
  const y = scaleLinear()
    .domain([0, top])
    .range([height - 2, 3]);
  const single = shape.points.length === 1;
  const path =
    area<[number, number]>()
      .x(([v]) => x(v))
      .y0(height - 2)
      .y1(([, d]) => y(d))(shape.points) ?? '';
  return (
    <svg
      role="img"
      aria-label={description}
      width={width}
      height={height}
      viewBox={`0 0 ${width} ${height}`}
      className="inline-block align-middle"
      data-chart="distribution-preview"
    >
      <title>{description}</title>
      {single ? (
        <line
          x1={width / 2}
          x2={width / 2}
          y1={3}
          y2={height - 2}
          stroke={accent.DEFAULT}
          strokeWidth={2}
          data-chart-part="shape"
        />
      ) : (
        <path d={path} fill={accent.soft} stroke={accent.DEFAULT} strokeWidth={1.5} data-chart-part="shape" />
      )}
      <line x1={1} x2={width - 1} y1={height - 1.5} y2={height - 1.5} stroke={ink.faint} />
      {!single && (
        <line
          x1={x(shape.mean)}
          x2={x(shape.mean)}
          y1={2}
          y2={height - 2}
          stroke={ink.DEFAULT}
          strokeWidth={1}
          strokeDasharray="2 2"
          data-chart-part="mean"
        />
      )}
    </svg>
  );
}
