// A run result made by the real engine from the stacked example, short enough for a unit test, and
// the stored run around it as the API returns it.
import type { RunDetail } from '../../../../shared/api/runs';
import stackedLoop from '../../../../shared/examples/stacked-loop.json';
import type { RunResult } from '../../../../shared/results/run-result';
import { runSettingsSchema } from '../../../../shared/scenario/run-settings';
import { runExperiment } from '../../../../workers/engine';
import { revision, scenarioSummary, USER, uuid } from '../../support/fixtures';

export const RESULT_SETTINGS = runSettingsSchema.parse({ hours: 0.5, warmupMinutes: 5, replications: 3, seed: 2026 });

export function engineResult(): Promise<RunResult> {
  return runExperiment(stackedLoop, RESULT_SETTINGS, { now: () => performance.now() });
}

export function storedRun(results: RunResult, overrides: Partial<RunDetail> = {}): RunDetail {
  const latest = revision(2);
  return {
    id: uuid(700),
    scenarioId: scenarioSummary().id,
    scenarioName: scenarioSummary().name,
    revisionId: latest.id,
    revisionNumber: latest.number,
    conveyorMode: latest.conveyorMode,
    name: 'Stacked, revision 2',
    seed: results.seed,
    engineVersion: results.engineVersion,
    serverChecked: false,
    settings: RESULT_SETTINGS,
    summary: {
      throughputPerHour: results.throughputPerHour,
      taktSeconds: results.taktSeconds,
      annualOutput: results.annualOutput,
      carriers: results.carriers.count,
      bottleneckStationId: results.bottleneckStationId,
    },
    createdBy: USER,
    createdAt: '2026-11-30T10:00:00.000Z',
    results,
    ...overrides,
  };
}
