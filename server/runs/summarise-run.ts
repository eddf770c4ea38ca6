// Pulls the headline numbers out of a posted result for the run's plain columns, and makes sure the
// result belongs to the settings it is stored with.
import { runSummaryOf, type RunSummary } from '../../shared/api/runs';
import type { RunResult } from '../../shared/results/run-result';
import type { RunSettings } from '../../shared/scenario/run-settings';
import { badRequest } from '../http/http-error';

export interface RunColumns {
  summary: RunSummary;
  seed: string;
  engineVersion: string;
}

export function summariseRun(settings: RunSettings, results: RunResult): RunColumns {
  // Both went through the same schema, so equal settings serialise identically.
  if (JSON.stringify(settings) !== JSON.stringify(results.settings)) {
    throw badRequest(
      'The run settings differ from the settings stored inside the results; send the settings the engine ran with.',
      [{ path: 'settings', message: 'does not match results.settings' }],
    );
  }
  return {
    summary: runSummaryOf(results),
    seed: results.seed,
    engineVersion: results.engineVersion,
  };
}
