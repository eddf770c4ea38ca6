// One experiment spread over the pool: its replications cut into one block per worker, run side by
// side, then merged by the engine's combineBlocks into the same result as a run in one piece (each
// replication's random streams depend only on the seed and its index). Progress adds up the blocks.
import * as Comlink from 'comlink';
import { runSettingsSchema } from '../../../shared/scenario/run-settings';
import type { Progress } from '../../../workers/engine';
import type { RangeOutcome, WorkerOutcome } from '../../../workers/simulation.worker';
import type { PoolSession } from './engine-pool';

/** Nearly equal consecutive ranges, at most `parts` of them, covering 0 .. replications - 1. */
export function splitReplications(replications: number, parts: number): { first: number; count: number }[] {
  const n = Math.max(1, Math.min(parts, replications));
  const ranges: { first: number; count: number }[] = [];
  let first = 0;
  for (let i = 0; i < n; i++) {
    const count = Math.floor(replications / n) + (i < replications % n ? 1 : 0);
    ranges.push({ first, count });
    first += count;
  }
  return ranges;
}

export async function runAcrossPool(
  session: PoolSession,
  scenario: unknown,
  settings: unknown,
  onProgress: (p: Progress) => void,
): Promise<WorkerOutcome> {
  const parsed = runSettingsSchema.safeParse(settings ?? {});
  // Invalid settings: let one worker answer with the engine's own messages and field paths.
  if (!parsed.success)
    return session.submit<WorkerOutcome>(async (api) => (await api.run(scenario, settings)) as WorkerOutcome);
  const { replications } = parsed.data;
  const ranges = splitReplications(replications, session.size);
  const simulated = ranges.map(() => 0);
  const totals = ranges.map(() => 0);
  const report = () => {
    const simulatedSeconds = simulated.reduce((a, b) => a + b, 0);
    const totalSeconds = totals.reduce((a, b) => a + b, 0) || 1;
    const perReplication = totalSeconds / replications;
    onProgress({
      replication: Math.min(replications - 1, Math.floor(simulatedSeconds / perReplication)),
      replications,
      simulatedSeconds,
      totalSeconds,
      fraction: simulatedSeconds / totalSeconds,
    });
  };
  const outcomes = await Promise.all(
    ranges.map((range, i) =>
      session.submit<RangeOutcome>(
        async (api) =>
          (await api.runRange(
            scenario,
            settings,
            range,
            Comlink.proxy((p: Progress) => {
              simulated[i] = p.simulatedSeconds;
              totals[i] = p.totalSeconds;
              report();
            }),
          )) as RangeOutcome,
      ),
    ),
  );
  const failed = outcomes.find((o) => !o.ok);
  if (failed && !failed.ok) return failed;
  const blocks = outcomes.flatMap((o) => (o.ok ? [o.block] : []));
  return session.submit<WorkerOutcome>(async (api) => (await api.combine(scenario, settings, blocks)) as WorkerOutcome);
}
