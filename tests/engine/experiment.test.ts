import { describe, expect, it } from 'vitest';
import { ENGINE_VERSION, InvalidInputError, isSimulationStopped, runExperiment } from '../../workers/engine';
import { compileLine } from '../../workers/engine/model/compile';
import { Replication } from '../../workers/engine/replication';
import { createStreamFactory } from '../../workers/engine/random/streams';
import { validateScenario } from '../../workers/engine';
import { runResultSchema } from '../../shared/results/run-result';
import { loadExample } from './helpers';

const noWait = { yieldToHost: async () => undefined };

describe('experiments', () => {
  it('gives byte-identical results for the same seed and different ones for another seed', async () => {
    const doc = loadExample('stacked-loop.json');
    const settings = { hours: 0.5, warmupMinutes: 5, replications: 2, seed: 'trial-a' };
    const first = JSON.stringify(await runExperiment(doc, settings, noWait));
    const second = JSON.stringify(await runExperiment(doc, settings, noWait));
    const other = JSON.stringify(await runExperiment(doc, { ...settings, seed: 'trial-b' }, noWait));
    expect(second).toBe(first);
    expect(other).not.toBe(first);
  });

  it('produces a result that matches the published result schema, with engine version and seed', async () => {
    const r = await runExperiment(
      loadExample('side-by-side-loop.json'),
      { hours: 0.25, warmupMinutes: 2, replications: 3, seed: 42 },
      noWait,
    );
    expect(runResultSchema.safeParse(r).success).toBe(true);
    expect(r.engineVersion).toBe(ENGINE_VERSION);
    expect(r.seed).toBe('42');
    expect(r.replications).toHaveLength(3);
    expect(r.throughputPerHour.ciLow).toBeLessThanOrEqual(r.throughputPerHour.mean);
    expect(r.throughputPerHour.ciHigh).toBeGreaterThanOrEqual(r.throughputPerHour.mean);
    expect(r.heatmaps.lanes[0].occupancy).toHaveLength(r.heatmaps.timeBins * r.heatmaps.lanes[0].positionBins);
  });

  it('keeps result size independent of the run length', async () => {
    const doc = loadExample('stacked-loop.json');
    const short = await runExperiment(doc, { hours: 0.2, warmupMinutes: 0, replications: 1 }, noWait);
    const long = await runExperiment(doc, { hours: 4, warmupMinutes: 0, replications: 1 }, noWait);
    expect(long.heatmaps.stations[0].shares.length).toBe(short.heatmaps.stations[0].shares.length);
    expect(long.leadTimeSeconds.histogram.counts.length).toBe(short.leadTimeSeconds.histogram.counts.length);
    expect(long.wip.series.values.length).toBe(short.wip.series.values.length);
  });

  it('stops a cancelled run with a recognisable error', async () => {
    let progressCalls = 0;
    const error = await runExperiment(
      loadExample('stacked-loop.json'),
      { hours: 200, warmupMinutes: 0, replications: 1 },
      {
        ...noWait,
        onProgress: () => progressCalls++,
        isCancelled: () => progressCalls > 0,
      },
    ).catch((e: unknown) => e);
    expect(isSimulationStopped(error) && error.reason).toBe('cancelled');
    expect(progressCalls).toBeGreaterThan(0);
  });

  it('reports progress as a growing fraction up to 1', async () => {
    const fractions: number[] = [];
    await runExperiment(
      loadExample('stacked-loop.json'),
      { hours: 0.5, warmupMinutes: 0, replications: 2 },
      { ...noWait, onProgress: (p) => fractions.push(p.fraction) },
    );
    expect(fractions.at(-1)).toBe(1);
    for (let i = 1; i < fractions.length; i++) expect(fractions[i]).toBeGreaterThanOrEqual(fractions[i - 1]);
  });

  it('stops at the event budget with the reason', async () => {
    const error = await runExperiment(
      loadExample('stacked-loop.json'),
      { hours: 8, replications: 1 },
      { ...noWait, eventBudget: 5_000 },
    ).catch((e: unknown) => e);
    expect(isSimulationStopped(error) && error.reason).toBe('eventBudget');
  });

  it('refuses invalid settings and a carrier override that does not fit, with paths', async () => {
    const doc = loadExample('stacked-loop.json');
    const bad = await runExperiment(doc, { hours: -1 }, noWait).catch((e: unknown) => e);
    expect(bad).toBeInstanceOf(InvalidInputError);
    expect((bad as InvalidInputError).issues[0].path).toBe('settings.hours');
    const crowded = await runExperiment(doc, { carriers: 1999 }, noWait).catch((e: unknown) => e);
    expect((crowded as InvalidInputError).issues[0].path).toBe('settings.carriers');
  });

  it('counts every loaded part as output, scrap or work in progress', () => {
    const checked = validateScenario(loadExample('stacked-loop.json'));
    if (!checked.ok) throw new Error('example invalid');
    const replication = new Replication(compileLine(checked.scenario), createStreamFactory(5, 0), {
      warmupSeconds: 0,
      endSeconds: 3600,
      timeBins: 10,
      positionBins: 10,
      eventBudget: 1e7,
      checkInvariants: true,
    });
    expect(replication.run(() => false)).toBe(true);
    const r = replication.recorder;
    expect(r.loadedCount).toBeGreaterThan(100);
    expect(r.loadedCount).toBe(r.outputCount + r.scrappedCount + replication.state.wip);
  });

  it('uses the carrier count override', async () => {
    const r = await runExperiment(
      loadExample('stacked-loop.json'),
      { hours: 0.2, warmupMinutes: 0, replications: 1, carriers: 6 },
      noWait,
    );
    expect(r.carriers.count).toBe(6);
  });
});
