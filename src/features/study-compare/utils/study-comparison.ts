// Two to four studies of one question side by side, for example the carrier sizing of a stacked and of
// a side-by-side layout. Points are matched by what they change (the same carrier count, the same
// swept value, the same station sped up); at every matched point each study's throughput has its 95 %
// interval and every other study's difference from the first (the reference) has a 95 % interval too.
// Replication r of two points drew from the same random streams when their point seeds, run lengths
// and warm-ups agree, so those differences are paired (common random numbers, Law, Simulation Modeling
// and Analysis, 5th ed. 2015, §10.2.1); otherwise the samples are independent and Welch's interval is
// used (§10.2.2).
import { pointSeed, type StudyDetail, type StudyKind } from '../../../../shared/api/studies';
import type { PointChange } from '../../../../shared/studies/point-changes';
import { CARRIER_COUNT_PATH } from '../../../../shared/studies/sweepable-fields';
import { pairedDifference, welchDifference, type MeanDifference } from '../../../../workers/analysis/compare-means';
import { pointStatistics, type PointStatistics } from '../../../../workers/studies/point-statistics';

export const STUDY_COMPARE_LIMITS = { min: 2, max: 4 } as const;

export interface ComparedStudy {
  id: string;
  label: string;
  study: StudyDetail;
}

export interface MatchedCell {
  stats: PointStatistics;
  /** The seed the point's replications drew from. */
  seed: string;
}

export interface MatchedPoint {
  key: string;
  /** The first study's label for the point, or the first that has it. */
  label: string;
  /** The point's value on the shared axis, when the studies share one. */
  x: number | null;
  /** One cell per study, null where a study has no such point. */
  cells: (MatchedCell | null)[];
  /** Throughput difference from the reference, per study; null for the reference and where either has no figures. */
  differences: (MeanDifference | null)[];
}

export interface StudyComparison {
  studies: readonly ComparedStudy[];
  /** The studies' kind when they all share it. */
  kind: StudyKind | null;
  /** The numeric axis every study sweeps (carrier count, or one swept field), or null. */
  axis: { path: string; label: string } | null;
  rows: MatchedPoint[];
  /** How the differences were formed: all paired, all Welch, or some of each. */
  pairing: 'paired' | 'welch' | 'mixed' | 'none';
}

function changeKey(c: PointChange): string {
  return `${c.path}:${c.op}:${JSON.stringify(c.value)}`;
}

/** Points with the same changes ask the same question; their order in the study does not matter. */
export const pointKey = (changes: readonly PointChange[]): string => changes.map(changeKey).sort().join('|');

function sharedAxis(studies: readonly ComparedStudy[]): StudyComparison['axis'] {
  const kinds = new Set(studies.map((s) => s.study.kind));
  if (kinds.size !== 1) return null;
  if (kinds.has('carrierSizing')) return { path: CARRIER_COUNT_PATH, label: 'Carriers' };
  if (!kinds.has('sweep')) return null;
  const axes = studies.map((s) => s.study.axes);
  const first = axes[0][0];
  if (!first || axes.some((a) => a.length !== 1 || a[0].path !== first.path)) return null;
  return { path: first.path, label: first.label };
}

function xOf(changes: readonly PointChange[], path: string): number | null {
  return changes.find((c) => c.path === path && c.op === 'set')?.value ?? null;
}

/** Throughput of the replications two points both finished, replication by replication. */
function commonReplications(a: PointStatistics, b: PointStatistics): [number[], number[]] {
  const left: number[] = [];
  const right: number[] = [];
  a.replications.forEach((fa, r) => {
    const fb = b.replications[r];
    if (fa && fb) {
      left.push(fa.throughputPerHour);
      right.push(fb.throughputPerHour);
    }
  });
  return [left, right];
}

const throughputs = (s: PointStatistics) => s.replications.flatMap((f) => (f ? [f.throughputPerHour] : []));

const hasFigures = (s: PointStatistics) => s.throughput !== null;

function sameRunLength(a: StudyDetail, b: StudyDetail): boolean {
  return a.settings.hours === b.settings.hours && a.settings.warmupMinutes === b.settings.warmupMinutes;
}

/** b − a at one point: paired over common replications when they share streams, else Welch. */
function differenceAt(a: MatchedCell, b: MatchedCell, sameLength: boolean): MeanDifference | null {
  if (!hasFigures(a.stats) || !hasFigures(b.stats)) return null;
  if (a.seed === b.seed && sameLength) {
    const [left, right] = commonReplications(a.stats, b.stats);
    if (left.length >= 2) return pairedDifference(left, right);
  }
  return welchDifference(throughputs(a.stats), throughputs(b.stats));
}

export function compareStudies(studies: readonly ComparedStudy[]): StudyComparison {
  if (studies.length < STUDY_COMPARE_LIMITS.min || studies.length > STUDY_COMPARE_LIMITS.max) {
    throw new RangeError(
      `compareStudies: compare ${STUDY_COMPARE_LIMITS.min} to ${STUDY_COMPARE_LIMITS.max} studies (got ${studies.length})`,
    );
  }
  const axis = sharedAxis(studies);
  const rows = new Map<string, MatchedPoint>();
  studies.forEach(({ study }, s) => {
    const stats = pointStatistics(study);
    for (const point of study.points) {
      const key = pointKey(point.changes);
      let row = rows.get(key);
      if (!row) {
        row = {
          key,
          label: point.label,
          x: axis ? xOf(point.changes, axis.path) : null,
          cells: studies.map(() => null),
          differences: studies.map(() => null),
        };
        rows.set(key, row);
      }
      // A study that repeats a point keeps its first; repeats add nothing to compare.
      row.cells[s] ??= {
        stats: stats[point.index],
        seed: String(pointSeed(study.settings, study.commonRandomNumbers, point.index)),
      };
    }
  });
  const methods = new Set<string>();
  const reference = studies[0].study;
  for (const row of rows.values()) {
    const base = row.cells[0];
    if (!base) continue;
    row.cells.forEach((cell, s) => {
      if (s === 0 || !cell) return;
      const d = differenceAt(base, cell, sameRunLength(reference, studies[s].study));
      row.differences[s] = d;
      if (d) methods.add(d.method);
    });
  }
  const ordered = [...rows.values()];
  if (axis) ordered.sort((a, b) => (a.x ?? Infinity) - (b.x ?? Infinity));
  const pairing =
    methods.size === 0 ? 'none' : methods.size === 2 ? 'mixed' : methods.has('paired') ? 'paired' : 'welch';
  const kinds = new Set(studies.map((s) => s.study.kind));
  return { studies, kind: kinds.size === 1 ? studies[0].study.kind : null, axis, rows: ordered, pairing };
}

/** Each study's throughput curve over the shared axis: finished points only, in ascending x. */
export function throughputSeries(comparison: StudyComparison) {
  return comparison.studies.map((study, s) => ({
    label: study.label,
    points: comparison.rows.flatMap((row) => {
      const ci = row.cells[s]?.stats.throughput;
      return row.x !== null && ci ? [{ x: row.x, mean: ci.mean, lower: ci.ciLow, upper: ci.ciHigh }] : [];
    }),
  }));
}

/** Scenario names, with the study's name added where two studies run one scenario. */
export function labelStudies(studies: readonly StudyDetail[]): ComparedStudy[] {
  return studies.map((study) => ({
    id: study.id,
    study,
    label:
      studies.filter((s) => s.scenarioName === study.scenarioName).length > 1
        ? `${study.scenarioName} (${study.name})`
        : study.scenarioName,
  }));
}
