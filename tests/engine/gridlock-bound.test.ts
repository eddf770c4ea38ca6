// The most carriers a layout runs without gridlock: one fewer than its smallest loop of lanes and
// transfers holds. Checked against the engine itself: every example runs at that count without a
// stop, and a single loop filled to the last place locks at once. A carrier-sizing study stops adding
// counts above the first that gridlocks and marks them as not run.
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { gridlockFreeCarriers, isSimulationStopped, runExperiment, trackCapacity } from '../../workers/engine';
import { smallestLoopCapacity } from '../../workers/engine/validate';
import { carrierSizingPoints } from '../../workers/studies/build-points';
import { pointStatistics } from '../../workers/studies/point-statistics';
import { runStudyLocally } from '../../workers/studies/run-study-locally';
import { loadExample } from './helpers';

const SETTINGS = { hours: 2, warmupMinutes: 10, replications: 2, seed: 5 };
const withCarriers = (doc: Record<string, unknown>, count: number) => ({
  ...doc,
  carriers: { ...(doc.carriers as object), count },
});

async function stopReason(doc: unknown): Promise<string | null> {
  try {
    await runExperiment(doc, SETTINGS, { yieldToHost: async () => undefined });
    return null;
  } catch (e) {
    if (isSimulationStopped(e)) return e.reason;
    throw e;
  }
}

describe('the gridlock-free carrier count', () => {
  it('is the smallest loop less one: both lanes and both transfers of a two-lane loop', () => {
    const s = scenarioSchema.parse(loadExample('stacked-loop.json'));
    expect(smallestLoopCapacity(s)).toBe(82);
    expect(gridlockFreeCarriers(s)).toBe(81);
    // The split line's smallest loop runs through fit-a on direct links: 15 + 10 + 15 + 40 lanes, 2 transfers.
    const split = scenarioSchema.parse(loadExample('multi-lane-split.json'));
    expect(smallestLoopCapacity(split)).toBe(82);
    expect(trackCapacity(split)).toBe(94);
    expect(gridlockFreeCarriers(split)).toBe(81);
  });

  it.each(['stacked-loop.json', 'side-by-side-loop.json', 'multi-lane-split.json', 'triple-deck.json'])(
    '%s runs at that count without a gridlock',
    async (file) => {
      const doc = loadExample(file);
      const n = gridlockFreeCarriers(scenarioSchema.parse(doc));
      expect(await stopReason(withCarriers(doc, n))).toBeNull();
    },
    60_000,
  );

  it.each(['stacked-loop.json', 'side-by-side-loop.json'])('%s locks with one carrier more', async (file) => {
    const doc = loadExample(file);
    const n = gridlockFreeCarriers(scenarioSchema.parse(doc));
    expect(await stopReason(withCarriers(doc, n + 1))).toBe('gridlock');
  });
});

describe('a carrier-sizing study that reaches gridlock', () => {
  it('marks the gridlocked count and does not run the counts above it', async () => {
    const id = '00000000-0000-4000-8000-0000000000b1';
    const points = carrierSizingPoints([20, 82, 81, 90]).map((p, index) => ({
      index,
      label: p.label,
      revisionId: id,
      changes: p.changes ?? [],
    }));
    const settings = { ...SETTINGS, replications: 2 };
    const study = await runStudyLocally(
      { id, kind: 'carrierSizing', settings, commonRandomNumbers: true, blockSize: 1, points },
      { [id]: loadExample('stacked-loop.json') },
    );
    const stats = pointStatistics(study);
    expect(stats.map((s) => s.state)).toEqual(['done', 'gridlock', 'done', 'skipped']);
    expect(stats[1].throughput).toBeNull();
    expect(stats[1].message).toMatch(/^gridlock at t=/);
    expect(stats[3].message).toMatch(/not run: 82 carriers already gridlock this track/);
    // 81 lies below the gridlocked count, so it still runs (the runner only skips counts above).
    expect(stats[2].throughput!.mean).toBeGreaterThan(0);
  });
});
