// The comparison of studies in words: for every study after the first, at how many shared points it
// makes significantly more or less than the first (95 % interval on the difference excludes zero) and
// where the difference is largest, and each study's best point.
import { formatNumber, formatSigned } from '../../../lib/format-number';
import type { StudyComparison } from './study-comparison';

const rate = (x: number) => `${formatNumber(x, 1)} parts/h`;

/** A study's best point: the first (fewest carriers, smallest setting) whose mean lies within the top mean's 95 % interval. */
function bestOf(comparison: StudyComparison, s: number): string {
  const finished = comparison.rows.flatMap((row) => {
    const ci = row.cells[s]?.stats.throughput;
    return ci ? [{ label: row.label, ci }] : [];
  });
  const label = comparison.studies[s].label;
  if (finished.length === 0) return `${label} no finished point yet`;
  const top = finished.reduce((a, b) => (b.ci.mean > a.ci.mean ? b : a));
  const best = finished.find((p) => p.ci.mean >= Math.min(top.ci.mean, top.ci.ciLow))!;
  return `${label} ${rate(top.ci.mean)} (${best === top ? best.label : `from ${best.label} within its interval`})`;
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
  const same = shared.length - more - less;
  const clauses = [
    more > 0 ? `significantly more than ${reference} at ${more}` : '',
    less > 0 ? `significantly less${more > 0 ? '' : ` than ${reference}`} at ${less}` : '',
    same > 0 ? `no significantly different amount${more + less > 0 ? '' : ` from ${reference}`} at ${same}` : '',
  ].filter(Boolean);
  const listed = clauses.length > 1 ? `${clauses.slice(0, -1).join(', ')} and ${clauses.at(-1)}` : clauses[0];
  return (
    `At ${points} both ran, ${label} makes ${listed}; the largest difference is ${formatSigned(d.difference, 1)} parts/h ` +
    `at ${largest.label} (95 % ${method} interval ${formatSigned(d.ciLow, 1)} to ${formatSigned(d.ciHigh, 1)}).`
  );
}

export function studyAnswer(comparison: StudyComparison): string {
  const sentences = comparison.studies.slice(1).map((_, i) => versus(comparison, i + 1));
  const best = comparison.studies.map((_, s) => bestOf(comparison, s));
  return `${sentences.join(' ')} Most throughput: ${best.join('; ')}.`;
}
