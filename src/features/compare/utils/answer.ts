// The comparison's answer in one sentence, with its evidence: which layout makes more, whether the
// difference is significant at 95 %, and what each costs when a price list is known.
import type { MeanDifference } from '../../../../workers/analysis/compare-means';
import type { Comparison, RunFigures } from './comparison';
import { formatMoney, formatNumber, formatSigned } from '../../../lib/format-number';

export interface RunCost {
  capitalCost: number;
  /** Capital cost per part per hour of throughput; null when the run made nothing. */
  perHourlyPart: number | null;
  currency: string;
}

/** Floor area per run id, in m², when the scenario documents are known. */
export type FloorAreas = ReadonlyMap<string, number>;

export interface Answer {
  sentence: string;
  winnerId: string | null;
  significant: boolean;
}

/** The interval of winner − other; one of the two is always the reference, whose differences are null. */
function differenceBetween(winner: RunFigures, other: RunFigures): MeanDifference {
  if (winner.differences) return winner.differences.throughputPerHour;
  const d = other.differences!.throughputPerHour;
  return { ...d, difference: -d.difference, ciLow: -d.ciHigh, ciHigh: -d.ciLow };
}

/** Why costs are missing from the answer, unless the page knows better (a shared link leaves prices out). */
export const NO_PRICE_LIST = 'No price list is set, so costs are not compared.';

function costClause(
  figures: readonly RunFigures[],
  costs: ReadonlyMap<string, RunCost> | undefined,
  withoutCosts: string,
): string {
  if (!costs || figures.some((f) => !costs.has(f.run.id))) return ` ${withoutCosts}`;
  const parts = figures.map((f) => {
    const cost = costs.get(f.run.id)!;
    const per =
      cost.perHourlyPart === null ? 'no capacity' : `${formatMoney(cost.perHourlyPart, cost.currency)} per part/h`;
    return `${f.run.label} ${formatMoney(cost.capitalCost, cost.currency)} (${per})`;
  });
  return ` Capital cost: ${parts.join(' against ')}.`;
}

function areaClause(figures: readonly RunFigures[], areas: FloorAreas | undefined): string {
  if (!areas || figures.some((f) => !areas.has(f.run.id))) return '';
  return ` Floor area: ${figures.map((f) => `${f.run.label} ${formatNumber(areas.get(f.run.id)!, 1)} m²`).join(' against ')}.`;
}

export function answerOf(
  comparison: Comparison,
  costs?: ReadonlyMap<string, RunCost>,
  areas?: FloorAreas,
  withoutCosts = NO_PRICE_LIST,
): Answer {
  const byThroughput = [...comparison.figures].sort(
    (a, b) => b.values.throughputPerHour.mean - a.values.throughputPerHour.mean,
  );
  const winner = byThroughput[0];
  const reference = comparison.figures[0];
  const other = winner === reference ? byThroughput[1] : reference;
  const d = differenceBetween(winner, other);
  const method = comparison.pairing === 'paired' ? 'paired' : 'Welch';
  const rate = (f: RunFigures) => `${formatNumber(f.values.throughputPerHour.mean, 1)} parts/h`;
  const interval = d.unavailable
    ? `no interval: ${d.unavailable}`
    : `95 % ${method} interval ${formatSigned(d.ciLow, 1)} to ${formatSigned(d.ciHigh, 1)}`;
  const costs2 = costClause([winner, other], costs, withoutCosts) + areaClause([winner, other], areas);
  if (d.significant && d.difference > 0) {
    return {
      sentence: `${winner.run.label} makes more: ${rate(winner)} against ${rate(other)} for ${other.run.label}, ${formatNumber(d.difference, 1)} parts/h more (${interval}), a significant difference.${costs2}`,
      winnerId: winner.run.id,
      significant: true,
    };
  }
  return {
    sentence: `Neither makes significantly more: ${winner.run.label} ${rate(winner)} against ${rate(other)} for ${other.run.label} (difference ${formatSigned(d.difference, 1)} parts/h, ${interval}, which includes zero), so choose on cost and space.${costs2}`,
    winnerId: null,
    significant: false,
  };
}
