// The comparison of studies in words: for every study after the first, at how many shared points it
// makes significantly more or less than the first (95 % interval on the difference excludes zero) and
// where the difference is largest, and each study's best point.
import { formatNumber, formatSigned } from '../../../lib/format-number';
import type { StudyComparison } from './study-comparison';

const rate = (x: number) => `${formatNumber(x, 1)} parts/h`;

function bestOf(comparison: StudyComparison, s: number): string {
  let best: { label: string; mean: number } | null = null;
  for (const row of comparison.rows) {
    const ci = row.cells[s]?.stats.throughput;
    // On a tie the earlier point (fewer carriers, the smaller setting) stays the best.
    if (ci && (!best || ci.mean > best.mean)) best = { label: row.label, mean: ci.mean };
  }
  const label = comparison.studies[s].label;
  return best ? `${label} ${rate(best.mean)} (${best.label})` : `${label} no finished point yet`;
}

function versus(comparison: StudyComparison, s: number): string {
  const reference = comparison.studies[0].label;
  const label = comparison.studies[s].label;
  const shared = comparison.rows.filter((r) => r.differences[s] && !r.differences[s]!.unavailable);
  if (shared.length === 0)
    return `${label} and ${reference} have no finished point in common with two or more replications, so they cannot be compared yet.`;
  const more = shared.filter((r) => r.differences[s]!.significant && r.differences[s]!.difference > 0).length;
  const less = shared.filter((r) => r.differences[s]!.significant && r.differences[s]!.difference < 0).length;
  const largest = shared.reduce((a, b) =>
    Math.abs(b.differences[s]!.difference) > Math.abs(a.differences[s]!.difference) ? b : a,
  );
  const d = largest.differences[s]!;
  const method = d.method === 'paired' ? 'paired' : 'Welch';
  const points = shared.length === 1 ? 'the one point' : `the ${shared.length} points`;
  return (
    `At ${points} both ran, ${label} makes significantly more than ${reference} at ${more}, significantly less at ${less} ` +
    `and no significantly different amount at ${shared.length - more - less}; the largest difference is ${formatSigned(d.difference, 1)} parts/h ` +
    `at ${largest.label} (95 % ${method} interval ${formatSigned(d.ciLow, 1)} to ${formatSigned(d.ciHigh, 1)}).`
  );
}

export function studyAnswer(comparison: StudyComparison): string {
  const sentences = comparison.studies.slice(1).map((_, i) => versus(comparison, i + 1));
  const best = comparison.studies.map((_, s) => bestOf(comparison, s));
  return `${sentences.join(' ')} Most throughput: ${best.join('; ')}.`;
}
