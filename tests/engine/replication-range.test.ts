// Replications run in blocks (as a pool of workers or server threads does) and merged give exactly the
// result of one run, because replication r draws only from the streams of (seed, r).
import { describe, expect, it } from 'vitest';
import { combineBlocks, InvalidInputError, runExperiment, runReplicationRange } from '../../workers/engine';
import { loadExample } from './helpers';

const fast = { yieldToHost: async () => undefined };

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
