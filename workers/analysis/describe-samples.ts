// Descriptive statistics of a time study: count, mean, spread, quantiles and histogram bins. Works on a
// sorted copy so quantiles and the histogram share one sort.
import type { HistogramRule, SampleSummary, TimeStudyHistogram } from '../../shared/api/time-studies';

/** A heavy tail would otherwise ask for thousands of bins no screen can show. */
export const HISTOGRAM_MAX_BINS = 100;

/** Linear interpolation between order statistics, Hyndman & Fan (1996, "Sample quantiles in statistical packages") definition 7. */
export function quantileSorted(sorted: readonly number[], p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

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
      p05: quantileSorted(sorted, 0.05),
      p25: quantileSorted(sorted, 0.25),
      p50: quantileSorted(sorted, 0.5),
      p75: quantileSorted(sorted, 0.75),
      p95: quantileSorted(sorted, 0.95),
    },
  };
}

/**
 * Equal-width bins from min to max. Width by Freedman & Diaconis (1981, "On the histogram as a density
 * estimator: L2 theory", Z. Wahrscheinlichkeitstheorie 57), h = 2 · IQR · n^(−1/3); where the IQR is zero
 * (over half the samples equal) Sturges' rule, ⌈log₂ n⌉ + 1 bins (Sturges 1926, "The choice of a class
 * interval", JASA 21). The last bin includes the maximum.
 */
export function histogram(sorted: readonly number[]): TimeStudyHistogram {
  const n = sorted.length;
  const lo = sorted[0];
  const hi = sorted[n - 1];
  if (hi === lo) return { rule: 'sturges', binWidth: 1, bins: [{ x0: lo - 0.5, x1: lo + 0.5, count: n }] };
  const iqr = quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25);
  const rule: HistogramRule = iqr > 0 ? 'freedman-diaconis' : 'sturges';
  const wanted = rule === 'freedman-diaconis' ? Math.ceil(((hi - lo) * Math.cbrt(n)) / (2 * iqr)) : Math.ceil(Math.log2(n)) + 1;
  const count = Math.min(HISTOGRAM_MAX_BINS, Math.max(1, wanted));
  const width = (hi - lo) / count;
  const counts = new Array<number>(count).fill(0);
  for (const v of sorted) counts[Math.min(count - 1, Math.floor((v - lo) / width))] += 1;
  return {
    rule,
    binWidth: width,
    bins: counts.map((c, i) => ({ x0: lo + i * width, x1: i === count - 1 ? hi : lo + (i + 1) * width, count: c })),
  };
}
