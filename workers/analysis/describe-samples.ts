// Descriptive statistics of a time study: count, mean, spread, quantiles and histogram bins. Works on a
// sorted copy so quantiles and the histogram share one sort.
// Quantiles and bins come from d3-array: its quantileSorted interpolates between order statistics,
// Hyndman & Fan (1996, "Sample quantiles in statistical packages") definition 7.
import { bin, quantileSorted } from 'd3-array';
import type { HistogramRule, SampleSummary, TimeStudyHistogram } from '../../shared/api/time-studies';

/** d3's types ask for a mutable array; quantileSorted only reads it. Defined for a non-empty sample. */
function quantile(sorted: readonly number[], p: number): number {
  return quantileSorted(sorted as number[], p)!;
}

/** A heavy tail would otherwise ask for thousands of bins no screen can show. */
export const HISTOGRAM_MAX_BINS = 100;

export function mean(values: readonly number[]): number {
  let sum = 0;
  for (const v of values) sum += v;
  return sum / values.length;
}

/** Σ (x − m)², accumulated about the mean to avoid the cancellation of Σx² − n m². */
export function sumOfSquares(values: readonly number[], m: number): number {
  let sum = 0;
  for (const v of values) sum += (v - m) * (v - m);
  return sum;
}

export function summarise(sorted: readonly number[]): SampleSummary {
  const n = sorted.length;
  const m = mean(sorted);
  const sd = n > 1 ? Math.sqrt(sumOfSquares(sorted, m) / (n - 1)) : 0;
  return {
    count: n,
    mean: m,
    sd,
    cv: m !== 0 ? sd / Math.abs(m) : null,
    min: sorted[0],
    max: sorted[n - 1],
    quantiles: {
      p05: quantile(sorted, 0.05),
      p25: quantile(sorted, 0.25),
      p50: quantile(sorted, 0.5),
      p75: quantile(sorted, 0.75),
      p95: quantile(sorted, 0.95),
    },
  };
}

/**
 * How many equal-width bins a sample wants. Freedman & Diaconis (1981, "On the histogram as a density
 * estimator: L2 theory", Z. Wahrscheinlichkeitstheorie 57): width h = 2 · IQR · n^(−1/3), rounded up to
 * whole bins over the range; where the IQR is zero (over half the samples equal) Sturges' rule,
 * ⌈log₂ n⌉ + 1 bins (Sturges 1926, "The choice of a class interval", JASA 21). The one home of the rule:
 * the time-study histogram and the client's Histogram both ask here.
 */
export function histogramRule(sorted: readonly number[]): { rule: HistogramRule; binCount: number } {
  const n = sorted.length;
  const range = sorted[n - 1] - sorted[0];
  const iqr = n > 1 ? quantile(sorted, 0.75) - quantile(sorted, 0.25) : 0;
  if (iqr > 0)
    return { rule: 'freedman-diaconis', binCount: Math.max(1, Math.ceil((range * Math.cbrt(n)) / (2 * iqr))) };
  return { rule: 'sturges', binCount: Math.ceil(Math.log2(Math.max(1, n))) + 1 };
}

/** Equal-width bins from min to max by histogramRule, at most HISTOGRAM_MAX_BINS; the last bin includes the maximum. */
export function histogram(sorted: readonly number[]): TimeStudyHistogram {
  const n = sorted.length;
  const lo = sorted[0];
  const hi = sorted[n - 1];
  if (hi === lo) return { rule: 'sturges', binWidth: 1, bins: [{ x0: lo - 0.5, x1: lo + 0.5, count: n }] };
  const { rule, binCount } = histogramRule(sorted);
  const count = Math.min(HISTOGRAM_MAX_BINS, binCount);
  const width = (hi - lo) / count;
  const thresholds = Array.from({ length: count - 1 }, (_, i) => lo + (i + 1) * width);
  const bins = bin().domain([lo, hi]).thresholds(thresholds)(sorted as number[]);
  return { rule, binWidth: width, bins: bins.map((b) => ({ x0: b.x0!, x1: b.x1!, count: b.length })) };
}
