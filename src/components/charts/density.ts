// Shape estimates for samples: histogram bins of equal width and a Gaussian kernel density (the kernel
// density estimate itself is simple-statistics'; the bandwidth rule is Silverman's, below).
import { bin, deviation, extent, quantileSorted, scaleLinear } from 'd3';
import { kernelDensityEstimation } from 'simple-statistics';
import { histogramRule } from '../../../workers/analysis/describe-samples';

export interface Bin {
  x0: number;
  x1: number;
  count: number;
}

/**
 * Equal-width bins on a rounded range. The default count is the time-study rule (Freedman & Diaconis,
 * Sturges where the IQR is zero: histogramRule), kept between 5 and 60 so a screen can show it.
 */
export function histogramBins(values: readonly number[], binCount?: number): Bin[] {
  if (values.length === 0) return [];
  let [lo, hi] = extent(values) as [number, number];
  if (lo === hi) [lo, hi] = [lo - 0.5, hi + 0.5];
  const wanted = binCount ?? Math.min(60, Math.max(5, histogramRule([...values].sort((a, b) => a - b)).binCount));
  const scale = scaleLinear().domain([lo, hi]).nice(wanted);
  const thresholds = scale.ticks(wanted);
  const [d0, d1] = scale.domain();
  return bin()
    .domain([d0, d1])
    .thresholds(thresholds)(values as number[])
    .filter((b) => (b.x1 ?? 0) > (b.x0 ?? 0))
    .map((b) => ({ x0: b.x0 ?? d0, x1: b.x1 ?? d1, count: b.length }));
}

/**
 * Silverman's rule of thumb, h = 0.9 · min(s, IQR / 1.34) · n^(−1/5) (Silverman, "Density Estimation for
 * Statistics and Data Analysis", 1986, eq. 3.31). Falls back to s, then to 1, for degenerate samples.
 */
export function silvermanBandwidth(samples: readonly number[]): number {
  const n = samples.length;
  if (n < 2) return 1;
  const sd = deviation(samples) ?? 0;
  const sorted = [...samples].sort((a, b) => a - b);
  const iqr = (quantileSorted(sorted, 0.75) ?? 0) - (quantileSorted(sorted, 0.25) ?? 0);
  const spread = iqr > 0 ? Math.min(sd, iqr / 1.34) : sd;
  return spread > 0 ? 0.9 * spread * n ** -0.2 : 1;
}

/** The Gaussian kernel density of the samples at Silverman's bandwidth unless one is given. */
export function gaussianKde(
  samples: readonly number[],
  bandwidth = silvermanBandwidth(samples),
): (x: number) => number {
  return kernelDensityEstimation([...samples], 'gaussian', bandwidth);
}

/** Evenly spaced points of a density over a range, ready for a line or an area. */
export function sampleCurve(
  density: (x: number) => number,
  lo: number,
  hi: number,
  points = 120,
): Array<[number, number]> {
  return Array.from({ length: points }, (_, i) => {
    const x = lo + ((hi - lo) * i) / (points - 1);
    const value = density(x);
    return [x, Number.isFinite(value) ? value : 0];
  });
}
