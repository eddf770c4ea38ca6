// Shared set-up for engine behaviour tests: example documents and a run with invariant checks on.
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { RunSettingsInput } from '../../shared/scenario/run-settings';
import { runExperiment } from '../../workers/engine';

export const EXAMPLES_DIR = join(__dirname, '../../shared/examples');

export function exampleFiles(): string[] {
  return readdirSync(EXAMPLES_DIR)
    .filter((f) => f.endsWith('.json'))
    .sort();
}

export function loadExample(file: string): Record<string, unknown> {
  return JSON.parse(readFileSync(join(EXAMPLES_DIR, file), 'utf8')) as Record<string, unknown>;
}

/** Runs with overlap and conservation checked after every event, never yielding to a timer. */
export function checkedRun(scenario: unknown, settings: RunSettingsInput) {
  return runExperiment(scenario, settings, { checkInvariants: true, yieldToHost: async () => undefined });
}
