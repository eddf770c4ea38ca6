// Replications run in blocks (as a pool of workers or server threads does) and merged give exactly the
// result of one run, because replication r draws only from the streams of (seed, r).
import { describe, expect, it } from 'vitest';
import {
  blockFromJson,
  blockToJson,
  combineBlocks,
  InvalidInputError,
  runExperiment,
  runReplicationRange,
} from '../../workers/engine';
import type { RunResult } from '../../shared/results/run-result';
import { loadExample } from './helpers';

const fast = { yieldToHost: async () => undefined };

/** Every number of a equals b's to `digits` significant digits; everything else is equal. */
function closeEverywhere(a: unknown, b: unknown, digits: number, path = 'result'): string[] {
  if (typeof a === 'number' && typeof b === 'number') {
    const scale = Math.max(Math.abs(a), Math.abs(b), 1e-9);
    return Math.abs(a - b) <= scale * 10 ** -digits ? [] : [`${path}: ${a} against ${b}`];
  }
  if (Array.isArray(a) && Array.isArray(b))
    return a.length !== b.length
      ? [`${path}: ${a.length} entries against ${b.length}`]
      : a.flatMap((x, i) => closeEverywhere(x, b[i], digits, `${path}[${i}]`));
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    const keys = new Set([...Object.keys(a), ...Object.keys(b)]);
    return [...keys].flatMap((k) =>
      closeEverywhere((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k], digits, `${path}.${k}`),
    );
  }
  return Object.is(a, b) ? [] : [`${path}: ${String(a)} against ${String(b)}`];
}

describe('replication ranges', () => {
  it('blocks merged in any order equal a single run of all replications', async () => {
    const scenario = loadExample('stacked-loop.json');
    const settings = { hours: 0.5, warmupMinutes: 5, replications: 5, seed: 42 };
    const whole = await runExperiment(scenario, settings, fast);
    const a = await runReplicationRange(scenario, settings, { first: 0, count: 2 }, fast);
    const b = await runReplicationRange(scenario, settings, { first: 2, count: 3 }, fast);
    const merged = combineBlocks(scenario, settings, [b, a]);
    expect(merged).toEqual(whole);
  });

  it('blocks stored as JSON, series once per block, merge into the single run to stored precision', async () => {
    const scenario = loadExample('stacked-loop.json');
    const settings = { hours: 0.5, warmupMinutes: 5, replications: 5, seed: 7 };
    const whole = await runExperiment(scenario, settings, fast);
    const stored = [
      blockToJson(await runReplicationRange(scenario, settings, { first: 0, count: 3 }, fast)),
      blockToJson(await runReplicationRange(scenario, settings, { first: 3, count: 2 }, fast)),
    ];
    for (const block of stored) {
      expect(block.series).toBeDefined();
      for (const s of block.summaries) expect(s).not.toHaveProperty('laneHeat');
    }
    // Stored numbers keep six significant digits, so five agree; the series (heatmaps and WIP over
    // time) are rounded to four in a result, where a stored mean can fall one unit the other side.
    const agrees = (merged: RunResult) => [
      ...closeEverywhere(
        { ...merged, heatmaps: null, wip: merged.wip.mean },
        { ...whole, heatmaps: null, wip: whole.wip.mean },
        5,
      ),
      ...closeEverywhere([merged.heatmaps, merged.wip.series], [whole.heatmaps, whole.wip.series], 3),
    ];
    expect(agrees(combineBlocks(scenario, settings, stored.map(blockFromJson)))).toEqual([]);
    // The form stored before, each summary with its own series, still reads back.
    const older = stored.map((b) => ({
      ...b,
      series: undefined,
      summaries: b.summaries.map((s) => ({ ...s, ...b.series })),
    }));
    expect(agrees(combineBlocks(scenario, settings, older.map(blockFromJson)))).toEqual([]);
    // The series are nearly all of a summary: once per block, a block of three is well under half the older size.
    expect(JSON.stringify(stored[0]).length).toBeLessThan(0.5 * JSON.stringify(older[0]).length);
  });

  it('refuses blocks that leave a replication out or count one twice', async () => {
    const scenario = loadExample('stacked-loop.json');
    const settings = { hours: 0.1, warmupMinutes: 0, replications: 3, seed: 1 };
    const a = await runReplicationRange(scenario, settings, { first: 0, count: 2 }, fast);
    const c = await runReplicationRange(scenario, settings, { first: 1, count: 2 }, fast);
    expect(() => combineBlocks(scenario, settings, [a])).toThrow(/2 replications but the settings ask for 3/);
    expect(() => combineBlocks(scenario, settings, [a, c])).toThrow(InvalidInputError);
  });

  it('refuses a range with a negative first index', async () => {
    const scenario = loadExample('stacked-loop.json');
    await expect(runReplicationRange(scenario, { hours: 0.1 }, { first: -1, count: 1 }, fast)).rejects.toThrow(
      /whole first index/,
    );
  });
});
