// The numeric fields of a scenario a sweep may vary, each with its path (as point changes use it), a
// label a user recognises and its present value.
import type { Distribution } from '../scenario/distribution';
import type { Scenario } from '../scenario/scenario';

export type SweepableField = {
  path: string;
  label: string;
  group: string;
  unit: string;
  value: number;
  whole?: boolean;
};

/** The path of the carrier count, the field a carrier-sizing study varies. */
export const CARRIER_COUNT_PATH = 'carriers.count';

const PARAMETER_LABELS: Record<string, string> = {
  value: 'time',
  min: 'min',
  mode: 'mode',
  max: 'max',
  mean: 'mean',
  sd: 'sd',
  cv: 'cv',
  k: 'phases k',
};

function distributionFields(d: Distribution, path: string, label: string, group: string): SweepableField[] {
  return Object.entries(d)
    .filter((entry): entry is [string, number] => typeof entry[1] === 'number')
    .map(([key, value]) => ({
      path: `${path}.${key}`,
      label: `${label} ${PARAMETER_LABELS[key] ?? key}`,
      group,
      unit: key === 'cv' || key === 'k' ? '' : 's',
      value,
      whole: key === 'k',
    }));
}

export function sweepableFields(s: Scenario): SweepableField[] {
  const fields: SweepableField[] = [
    {
      path: CARRIER_COUNT_PATH,
      label: 'Carrier count',
      group: 'Carriers',
      unit: '',
      value: s.carriers.count,
      whole: true,
    },
  ];
  const motion = (profile: 'loaded' | 'empty', name: string) => {
    const p = s.carriers[profile];
    if (!p) return;
    fields.push(
      {
        path: `carriers.${profile}.vMaxMmPerS`,
        label: `Carrier speed, ${name}`,
        group: 'Carriers',
        unit: 'mm/s',
        value: p.vMaxMmPerS,
      },
      {
        path: `carriers.${profile}.aMaxMmPerS2`,
        label: `Carrier acceleration, ${name}`,
        group: 'Carriers',
        unit: 'mm/s²',
        value: p.aMaxMmPerS2,
      },
    );
  };
  motion('loaded', 'loaded');
  motion('empty', 'empty');
  s.steps.forEach((step, i) =>
    step.stations.forEach((station, j) => {
      const base = `steps.${i}.stations.${j}`;
      const group = `Station ${station.name}`;
      fields.push(...distributionFields(station.cycleTimeSeconds, `${base}.cycleTimeSeconds`, 'Cycle time', group));
      if (station.failures) {
        fields.push(
          ...distributionFields(
            station.failures.timeBetweenFailuresSeconds,
            `${base}.failures.timeBetweenFailuresSeconds`,
            'MTBF',
            group,
          ),
        );
        fields.push(
          ...distributionFields(
            station.failures.timeToRepairSeconds,
            `${base}.failures.timeToRepairSeconds`,
            'MTTR',
            group,
          ),
        );
      }
    }),
  );
  s.transfers.forEach((t, i) => {
    if (t.kind !== 'elevator') return;
    // Names often say "Elevator" already; "Elevator Elevator east" reads as a slip.
    const group = /^elevator\b/i.test(t.name) ? t.name : `Elevator ${t.name}`;
    fields.push(
      { path: `transfers.${i}.handlingSeconds`, label: 'Handling time', group, unit: 's', value: t.handlingSeconds },
      { path: `transfers.${i}.liftSpeedMmPerS`, label: 'Lift speed', group, unit: 'mm/s', value: t.liftSpeedMmPerS },
    );
  });
  return fields;
}
