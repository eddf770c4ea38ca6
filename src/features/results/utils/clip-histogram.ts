// A few parts held up by a break or a failure can take many times the usual lead time; drawn to
// scale they squeeze nearly every part into one bar. The axis stops at a high percentile and the
// parts beyond it share one last bar.

export interface ClippedHistogram {
  /** Counts of the bins drawn to scale, from zero. */
  counts: number[];
  /** Parts at or beyond `overflowFromSeconds`, drawn as one extra bar; null when nothing is clipped. */
  overflow: { fromSeconds: number; count: number } | null;
  total: number;
}

export const CLIP_QUANTILE = 0.99;

export function clipHistogram(
  counts: readonly number[],
  binWidthSeconds: number,
  quantile = CLIP_QUANTILE,
): ClippedHistogram {
  let last = counts.length - 1;
  while (last >= 0 && counts[last] <= 0) last--;
  const kept = counts.slice(0, last + 1);
  const total = kept.reduce((a, b) => a + b, 0);
  if (total === 0) return { counts: [], overflow: null, total: 0 };
  let cumulative = 0;
  let cut = 0;
  for (; cut < kept.length; cut++) {
    cumulative += kept[cut];
    if (cumulative >= quantile * total) break;
  }
  // Gathering only the final bin would change nothing a reader can see.
  if (cut >= kept.length - 2) return { counts: kept, overflow: null, total };
  const beyond = kept.slice(cut + 1).reduce((a, b) => a + b, 0);
  return {
    counts: kept.slice(0, cut + 1),
    overflow: { fromSeconds: (cut + 1) * binWidthSeconds, count: beyond },
    total,
  };
}
