// The points of each kind of study, as plain data the API stores: carrier counts for sizing, the
// grid of one or two swept fields, and for what-if the unchanged line followed by one point per
// station with its cycle time scaled down.
import type { StudyPointInput } from '../../shared/api/studies';
import type { Scenario } from '../../shared/scenario/scenario';
import { CARRIER_COUNT_PATH } from '../../shared/studies/sweepable-fields';

export function carrierSizingPoints(counts: number[]): StudyPointInput[] {
  return counts.map((n) => ({ label: `${n} carriers`, changes: [{ path: CARRIER_COUNT_PATH, op: 'set', value: n }] }));
}

export type SweepAxis = { path: string; label: string; values: number[] };

/** One point per value of a single axis, or per pair of values of two axes (first axis outermost). */
export function sweepPoints(axes: SweepAxis[]): StudyPointInput[] {
  const [x, y] = axes;
  if (!x) return [];
  const show = (v: number) => String(Number(v.toPrecision(6)));
  if (!y)
    return x.values.map((v) => ({ label: `${x.label} ${show(v)}`, changes: [{ path: x.path, op: 'set', value: v }] }));
  return x.values.flatMap((vx) =>
    y.values.map((vy) => ({
      label: `${x.label} ${show(vx)}, ${y.label} ${show(vy)}`,
      changes: [
        { path: x.path, op: 'set', value: vx },
        { path: y.path, op: 'set', value: vy },
      ],
    })),
  );
}

/** Evenly spaced values from `from` to `to` (both included); whole numbers when `whole`. */
export function rangeValues(from: number, to: number, count: number, whole = false): number[] {
  const n = Math.max(1, Math.floor(count));
  const values = n === 1 ? [from] : Array.from({ length: n }, (_, i) => from + ((to - from) * i) / (n - 1));
  const rounded = values.map((v) => (whole ? Math.round(v) : Number(v.toPrecision(6))));
  return [...new Set(rounded)];
}

export function whatIfPoints(s: Scenario, reduction: number): StudyPointInput[] {
  const points: StudyPointInput[] = [{ label: 'Line as it is', changes: [] }];
  s.steps.forEach((step, i) =>
    step.stations.forEach((station, j) => {
      points.push({
        label: station.name,
        changes: [{ path: `steps.${i}.stations.${j}.cycleTimeSeconds`, op: 'scale', value: 1 - reduction }],
      });
    }),
  );
  return points;
}
