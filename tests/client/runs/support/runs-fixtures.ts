// Stored-run list items shaped by the shared schema, for table and permission tests. Their figures
// are list summaries, not engine results: these tests check ordering and who sees which control.
import type { RunListItem, RunsPage } from '../../../../shared/api/runs';
import { runSettingsSchema } from '../../../../shared/scenario/run-settings';
import { USER, uuid } from '../../support/fixtures';

export const OTHER_USER = { id: uuid(3), name: 'Bram Oakes', email: 'bram@example.test' };

const interval = (mean: number, half: number) => ({ mean, ciLow: mean - half, ciHigh: mean + half });

export function runItem(
  n: number,
  overrides: {
    throughput?: number;
    takt?: number;
    carriers?: number;
    author?: typeof USER;
    revision?: number;
    createdAt?: string;
  } = {},
): RunListItem {
  const throughput = overrides.throughput ?? 300;
  return {
    id: uuid(500 + n),
    scenarioId: uuid(20),
    scenarioName: 'Stacked, 20 carriers',
    revisionId: uuid(100 + (overrides.revision ?? 2)),
    revisionNumber: overrides.revision ?? 2,
    conveyorMode: 'carriers',
    name: `Run ${n}`,
    seed: String(n),
    engineVersion: '1.1.0',
    serverChecked: false,
    settings: runSettingsSchema.parse({ hours: 1, warmupMinutes: 5, replications: 3, seed: n }),
    summary: {
      throughputPerHour: interval(throughput, 4),
      taktSeconds: interval(overrides.takt ?? 3600 / throughput, 0.2),
      annualOutput: interval(throughput * 3680, 10_000),
      carriers: overrides.carriers ?? 20,
      bottleneckStationId: 'FT1',
    },
    createdBy: overrides.author ?? USER,
    createdAt: overrides.createdAt ?? `2026-11-${String(10 + n).padStart(2, '0')}T09:00:00.000Z`,
  };
}

/** The server's answer for a scope without runs. */
export const EMPTY_RUNS_PAGE: RunsPage = {
  items: [],
  total: 0,
  offset: 0,
  limit: 25,
  choices: { authors: [], revisions: [], carriers: [] },
};
