// Runs an experiment: every replication of one scenario under one set of run settings. Replication r
// draws from the stream factory for (seed, r), one stream per station and purpose, so replications
// are independent and two scenarios run with the same seed share random numbers where their station
// ids match (common random numbers). The loop hands control back to the host about every 50 ms of
// wall time, so a Web Worker can take a cancel message and a UI can show progress.
import type { RunResult } from '../../shared/results/run-result';
import { runSettingsSchema, type RunSettings } from '../../shared/scenario/run-settings';
import type { Scenario } from '../../shared/scenario/scenario';
import { SimulationStoppedError } from './kernel/stop';
import { compileLine } from './model/compile';
import { Replication } from './model/simulation';
import { combineReplications } from './observe/combine';
import { summarizeReplication, type ReplicationSummary } from './observe/replication-summary';
import { createStreamFactory } from './random/streams';
import { checkCarrierCount, validateScenario, type ValidationIssue } from './validate';
import { ENGINE_VERSION } from './version';
import { formatIssuePath } from '../../shared/scenario/issue-path';

export type Progress = { replication: number; replications: number; simulatedSeconds: number; totalSeconds: number; fraction: number };

export type RunHooks = {
  onProgress?(p: Progress): void;
  isCancelled?(): boolean;
  /** Wall clock in milliseconds (performance.now or Date.now); the engine itself knows no host API. */
  now?(): number;
  /** Stop after this much wall time (ms) for the whole experiment. */
  wallClockBudgetMs?: number;
  /** Stop a replication after this many events. */
  eventBudget?: number;
  /** Check carrier overlap and conservation after every event (slow; for tests). */
  checkInvariants?: boolean;
  /** Hand control to the host; the default waits for a zero-delay timer. */
  yieldToHost?(): Promise<void>;
};

export const RESULT_TIME_BINS = 96;
export const RESULT_POSITION_BINS = 48;
const SLICE_MS = 50;
/** Far above a year of a large line (about 3 × 10^8 events); the wall-clock budget is the usual limit. */
const DEFAULT_EVENT_BUDGET = 5_000_000_000;

export class InvalidInputError extends Error {
  override readonly name = 'InvalidInputError';

  constructor(readonly issues: ValidationIssue[]) {
    super(issues.map((i) => `${i.path}: ${i.message}`).join('\n'));
  }
}

function prepare(scenarioInput: unknown, settingsInput: unknown): { scenario: Scenario; settings: RunSettings } {
  const checked = validateScenario(scenarioInput);
  if (!checked.ok) throw new InvalidInputError(checked.issues);
  const parsed = runSettingsSchema.safeParse(settingsInput ?? {});
  if (!parsed.success) {
    throw new InvalidInputError(parsed.error.issues.map((i) => ({ path: `settings.${formatIssuePath(i.path)}`, message: i.message })));
  }
  const settings = parsed.data;
  if (settings.carriers !== undefined) {
    const issues = checkCarrierCount(checked.scenario, settings.carriers, 'settings.carriers');
    if (issues.length > 0) throw new InvalidInputError(issues);
  }
  return { scenario: checked.scenario, settings };
}

const defaultYield = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

export async function runExperiment(scenarioInput: Scenario | unknown, settingsInput: RunSettings | unknown, hooks: RunHooks = {}): Promise<RunResult> {
  const { scenario, settings } = prepare(scenarioInput, settingsInput);
  const now = hooks.now ?? (() => Date.now());
  const started = now();
  const wallBudget = hooks.wallClockBudgetMs ?? Infinity;
  const line = compileLine(scenario, settings.carriers ?? scenario.carriers.count);
  const warmupSeconds = settings.warmupMinutes * 60;
  const endSeconds = warmupSeconds + settings.hours * 3600;
  const totalSeconds = endSeconds * settings.replications;
  const summaries: ReplicationSummary[] = [];
  const events: number[] = [];
  const yieldToHost = hooks.yieldToHost ?? defaultYield;
  const checkStop = () => {
    if (hooks.isCancelled?.()) throw new SimulationStoppedError('cancelled', 'the run was cancelled');
    if (now() - started > wallBudget) throw new SimulationStoppedError('wallClockBudget', `stopped after ${Math.round(wallBudget / 1000)} s of wall time, the budget for this run; use fewer replications or hours`);
  };
  for (let r = 0; r < settings.replications; r++) {
    const replication = new Replication(line, createStreamFactory(settings.seed, r), {
      warmupSeconds,
      endSeconds,
      timeBins: RESULT_TIME_BINS,
      positionBins: RESULT_POSITION_BINS,
      eventBudget: hooks.eventBudget ?? DEFAULT_EVENT_BUDGET,
      checkInvariants: hooks.checkInvariants,
    });
    for (;;) {
      checkStop();
      const sliceEnd = now() + SLICE_MS;
      if (replication.run(() => now() >= sliceEnd)) break;
      const simulatedSeconds = r * endSeconds + replication.state.now;
      hooks.onProgress?.({ replication: r, replications: settings.replications, simulatedSeconds, totalSeconds, fraction: simulatedSeconds / totalSeconds });
      await yieldToHost();
    }
    summaries.push(summarizeReplication(line, replication.recorder));
    events.push(replication.events);
    const simulatedSeconds = (r + 1) * endSeconds;
    hooks.onProgress?.({ replication: r, replications: settings.replications, simulatedSeconds, totalSeconds, fraction: simulatedSeconds / totalSeconds });
  }
  checkStop();
  return combineReplications({ line, settings, engineVersion: ENGINE_VERSION, reps: summaries, events, timeBins: RESULT_TIME_BINS, positionBins: RESULT_POSITION_BINS });
}
