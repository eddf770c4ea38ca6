// Carrier sizing: which counts to try, and which to recommend. The default range runs from one carrier
// per station (fewer leaves a station waiting for work by construction) to the most that can never
// gridlock (one fewer than the smallest loop of the track holds). The recommendation is the smallest
// count whose throughput is within a tolerance of the best and that meets the target when any count
// does, said in words with the price paid beyond it in lead time. Counts whose throughput cannot be
// told from the best are a tie, and a tie goes to the fewer carriers: they cost less.
import type { StudyDetail } from '../../shared/api/studies';
import type { Scenario } from '../../shared/scenario/scenario';
import { CARRIER_COUNT_PATH } from '../../shared/studies/sweepable-fields';
import { gridlockFreeCarriers } from '../engine';
import type { PointStatistics } from './point-statistics';

export const SIZING_DEFAULTS = { tolerance: 0.01, gridPoints: 20 } as const;

/** Counts from `low` to `high` on the smallest whole step that keeps to about `points` of them; `high` always included. */
export function carrierGrid(low: number, high: number, points: number = SIZING_DEFAULTS.gridPoints): number[] {
  const from = Math.max(1, Math.floor(low));
  const to = Math.max(from, Math.floor(high));
  const raw = (to - from) / Math.max(1, points - 1);
  const step = Math.max(1, Math.ceil(raw));
  const counts: number[] = [];
  for (let n = from; n < to; n += step) counts.push(n);
  counts.push(to);
  return counts;
}

export function defaultCarrierRange(s: Scenario): { low: number; high: number } {
  const stations = s.steps.reduce((sum, step) => sum + step.stations.length, 0);
  const high = gridlockFreeCarriers(s);
  return { low: Math.min(stations, high), high };
}

export type SizingPoint = { carriers: number; stats: PointStatistics };

/** Each point's carrier count beside its statistics (NaN for a point that does not set the count). */
export function sizingPointsOf(study: Pick<StudyDetail, 'points'>, stats: PointStatistics[]): SizingPoint[] {
  return stats.map((s) => ({
    carriers: study.points[s.index].changes.find((c) => c.path === CARRIER_COUNT_PATH)?.value ?? Number.NaN,
    stats: s,
  }));
}

/** The rate a scenario's target takt asks for, or null without a target. */
export const targetPerHourOf = (s: Scenario) => (s.targetTaktSeconds ? 3600 / s.targetTaktSeconds : null);

/** Station names in the order of a point's bottleneck shares. */
export const stationNamesOf = (s: Scenario) => s.steps.flatMap((step) => step.stations.map((st) => st.name));

export type SizingAdvice =
  | { kind: 'recommend'; carriers: number; best: number; meetsTarget: boolean | null; text: string }
  | { kind: 'unreachable'; best: number; bestThroughput: number; limitingStation: string | null; text: string }
  | { kind: 'none'; text: string };

/** A station that is the bottleneck less often than this does not limit the line on its own. */
const STATION_LIMIT_SHARE = 0.5;

const pct = (x: number) => `${Math.round(x * 100)} %`;
const perHour = (x: number) => `${x.toFixed(1)} parts/h`;

/**
 * @param targetPerHour the rate the target takt asks for (3600 / takt), or null without a target
 * @param stationNames names in the order of the points' bottleneck shares
 */
export function recommendCarriers(
  points: SizingPoint[],
  targetPerHour: number | null,
  stationNames: string[],
  tolerance: number = SIZING_DEFAULTS.tolerance,
): SizingAdvice {
  const usable = points
    .filter((p) => p.stats.throughput && (p.stats.state === 'done' || p.stats.state === 'partial'))
    .sort((a, b) => a.carriers - b.carriers);
  if (usable.length === 0)
    return { kind: 'none', text: 'No carrier count has finished yet, so there is nothing to recommend.' };
  const rate = (p: SizingPoint) => p.stats.throughput!.mean;
  const top = usable.reduce((a, b) => (rate(b) > rate(a) ? b : a));
  // The fewest carriers whose mean lies within the top point's 95 % interval (or equals it).
  const best = usable.find((p) => rate(p) >= Math.min(rate(top), top.stats.throughput!.ciLow))!;
  const bestAt =
    best === top
      ? ` at ${best.carriers} carriers`
      : `, reached within its 95 % interval from ${best.carriers} carriers`;
  const meets = (p: SizingPoint) => targetPerHour !== null && rate(p) >= targetPerHour;
  const anyMeets = usable.some(meets);
  if (targetPerHour !== null && !anyMeets) {
    const shares = best.stats.bottleneckShares;
    const limiting = shares.length > 0 ? shares.indexOf(Math.max(...shares)) : -1;
    const limitingStation = limiting >= 0 ? (stationNames[limiting] ?? null) : null;
    const limit = !limitingStation
      ? ''
      : shares[limiting] >= STATION_LIMIT_SHARE
        ? ` Station ${limitingStation} limits the line: it is the bottleneck ${pct(shares[limiting])} of the time at ${best.carriers} carriers, so more carriers cannot help; shorten its cycle time or add a station beside it.`
        : ` No station is the bottleneck most of the time (the most often is ${limitingStation}, ${pct(shares[limiting])} at ${best.carriers} carriers), so transport limits the line: look at the elevators, transfers and track speeds; more carriers cannot help.`;
    return {
      kind: 'unreachable',
      best: best.carriers,
      bestThroughput: rate(top),
      limitingStation,
      text: `No carrier count reaches the target of ${perHour(targetPerHour)}: the most is ${perHour(rate(top))}${bestAt}.${limit}`,
    };
  }
  const pick = usable.find((p) => rate(p) >= rate(top) * (1 - tolerance) && (!anyMeets || meets(p)))!;
  const beyond = usable.filter((p) => p.carriers > pick.carriers);
  const parts = [
    `${pick.carriers} carriers make ${perHour(rate(pick))}, within ${pct(tolerance)} of the best (${perHour(rate(top))}${bestAt})`,
  ];
  if (targetPerHour !== null) parts[0] += ` and meet the target of ${perHour(targetPerHour)}`;
  parts[0] += '.';
  if (beyond.length > 0) {
    const last = beyond[beyond.length - 1];
    const gain = rate(top) / rate(pick) - 1;
    const leadPick = pick.stats.leadSeconds?.mean;
    const leadLast = last.stats.leadSeconds?.mean;
    const leadGrowth = leadPick && leadLast ? leadLast / leadPick - 1 : null;
    const gainText = gain < tolerance ? `by less than ${pct(tolerance)}` : `by ${(gain * 100).toFixed(1)} %`;
    parts.push(
      `Beyond ${pick.carriers} carriers throughput rises ${gainText}${leadGrowth !== null ? ` while lead time ${leadGrowth >= 0 ? 'grows' : 'falls'} ${pct(Math.abs(leadGrowth))} (at ${last.carriers})` : ''}.`,
    );
  }
  return {
    kind: 'recommend',
    carriers: pick.carriers,
    best: best.carriers,
    meetsTarget: targetPerHour === null ? null : meets(pick),
    text: parts.join(' '),
  };
}
