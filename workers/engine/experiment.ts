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
import { Replication } from './replication';
import { combineReplications } from './observe/combine';
import { summarizeReplication, type ReplicationSummary } from './observe/replication-summary';
import { createStreamFactory } from './random/streams';
import { checkCarrierCount, validateScenario, type ValidationIssue } from './validate';
import { ENGINE_VERSION } from './version';
import { formatIssuePath } from '../../shared/scenario/issue-path';

export type Progress = {
  replication: number;
  replications: number;
  simulatedSeconds: number;
  totalSeconds: number;
  fraction: number;
};

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

export function prepare(scenarioInput: unknown, settingsInput: unknown): { scenario: Scenario; settings: RunSettings } {
  const checked = validateScenario(scenarioInput);
  if (!checked.ok) throw new InvalidInputError(checked.issues);
  const parsed = runSettingsSchema.safeParse(settingsInput ?? {});
  if (!parsed.success) {
    throw new InvalidInputError(
      parsed.error.issues.map((i) => ({ path: `settings.${formatIssuePath(i.path)}`, message: i.message })),
    );
  }
  const settings = parsed.data;
  if (settings.carriers !== undefined) {
    const issues = checkCarrierCount(checked.scenario, settings.carriers, 'settings.carriers');
    if (issues.length > 0) throw new InvalidInputError(issues);
  }
  return { scenario: checked.scenario, settings };
}

const defaultYield = () => new Promise<void>((resolve) => setTimeout(resolve, 0));

/** One block of finished replications: enough to merge with other blocks into one run result. */
export type ReplicationBlock = {
  /** Index of the first replication in the block; replication r always draws from stream (seed, r). */
  first: number;
  summaries: ReplicationSummary[];
  events: number[];
};

export type ReplicationRange = { first: number; count: number };

/**
 * Runs replications first .. first + count - 1 of an experiment. Blocks run anywhere (several Web
 * Workers, server threads) and merged with combineBlocks give the same result as one runExperiment,
 * because each replication's streams depend only on (seed, replication index).
 */
export async function runReplicationRange(
  scenarioInput: Scenario | unknown,
  settingsInput: RunSettings | unknown,
  range: ReplicationRange,
  hooks: RunHooks = {},
): Promise<ReplicationBlock> {
  const { scenario, settings } = prepare(scenarioInput, settingsInput);
  return runRange(scenario, settings, range, hooks);
}

async function runRange(
  scenario: Scenario,
  settings: RunSettings,
  range: ReplicationRange,
  hooks: RunHooks,
): Promise<ReplicationBlock> {
  if (!Number.isInteger(range.first) || range.first < 0 || !Number.isInteger(range.count) || range.count < 1) {
    throw new InvalidInputError([
      {
        path: 'range',
        message: `a replication range needs a whole first index of 0 or more and a count of 1 or more (got first ${range.first}, count ${range.count})`,
      },
    ]);
  }
  const now = hooks.now ?? (() => Date.now());
  const started = now();
  const wallBudget = hooks.wallClockBudgetMs ?? Infinity;
  const line = compileLine(scenario, settings.carriers ?? scenario.carriers.count);
  const warmupSeconds = settings.warmupMinutes * 60;
  const endSeconds = warmupSeconds + settings.hours * 3600;
  const totalSeconds = endSeconds * range.count;
  const summaries: ReplicationSummary[] = [];
  const events: number[] = [];
  const yieldToHost = hooks.yieldToHost ?? defaultYield;
  const checkStop = () => {
    if (hooks.isCancelled?.()) throw new SimulationStoppedError('cancelled', 'the run was cancelled');
    if (now() - started > wallBudget)
      throw new SimulationStoppedError(
        'wallClockBudget',
        `stopped after ${Math.round(wallBudget / 1000)} s of wall time, the budget for this run; use fewer replications or hours`,
      );
  };
  const report = (done: number, simulatedInBlock: number) => {
    const simulatedSeconds = done * endSeconds + simulatedInBlock;
    hooks.onProgress?.({
      replication: range.first + done,
      replications: range.count,
      simulatedSeconds,
      totalSeconds,
      fraction: simulatedSeconds / totalSeconds,
    });
  };
  for (let k = 0; k < range.count; k++) {
    const replication = new Replication(line, createStreamFactory(settings.seed, range.first + k), {
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
      report(k, replication.state.now);
      await yieldToHost();
    }
    summaries.push(summarizeReplication(line, replication.recorder));
    events.push(replication.events);
    report(k, endSeconds);
  }
  checkStop();
  return { first: range.first, summaries, events };
}

/** Merges blocks (in any order, without gaps or overlaps) into the run result of the whole experiment. */
export function combineBlocks(
  scenarioInput: Scenario | unknown,
  settingsInput: RunSettings | unknown,
  blocks: ReplicationBlock[],
): RunResult {
  const { scenario, settings } = prepare(scenarioInput, settingsInput);
  return combine(scenario, settings, blocks);
}

function combine(scenario: Scenario, settings: RunSettings, blocks: ReplicationBlock[]): RunResult {
  const ordered = [...blocks].sort((a, b) => a.first - b.first);
  let next = 0;
  for (const block of ordered) {
    if (block.first !== next) {
      throw new InvalidInputError([
        {
          path: 'blocks',
          message: `replication ${next} is ${block.first > next ? 'missing' : 'present twice'}; blocks must cover 0 .. ${settings.replications - 1} once each`,
        },
      ]);
    }
    next += block.summaries.length;
  }
  if (next !== settings.replications) {
    throw new InvalidInputError([
      {
        path: 'blocks',
        message: `the blocks hold ${next} replications but the settings ask for ${settings.replications}`,
      },
    ]);
  }
  const line = compileLine(scenario, settings.carriers ?? scenario.carriers.count);
  return combineReplications({
    line,
    settings,
    engineVersion: ENGINE_VERSION,
    reps: ordered.flatMap((b) => b.summaries),
    events: ordered.flatMap((b) => b.events),
    timeBins: RESULT_TIME_BINS,
    positionBins: RESULT_POSITION_BINS,
  });
}

export async function runExperiment(
  scenarioInput: Scenario | unknown,
  settingsInput: RunSettings | unknown,
  hooks: RunHooks = {},
): Promise<RunResult> {
  const { scenario, settings } = prepare(scenarioInput, settingsInput);
  const block = await runRange(scenario, settings, { first: 0, count: settings.replications }, hooks);
  return combine(scenario, settings, [block]);
}
