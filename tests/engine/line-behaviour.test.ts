import { describe, expect, it } from 'vitest';
import { isSimulationStopped, runExperiment, validateScenario } from '../../workers/engine';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { checkedRun, exampleFiles, loadExample } from './helpers';

const fixed = (value: number) => ({ kind: 'fixed' as const, value });

describe('line behaviour', () => {
  it.each(exampleFiles())('runs the example %s with carriers never overlapping and parts conserved', async (file) => {
    const r = await checkedRun(loadExample(file), { hours: 0.5, warmupMinutes: 5, replications: 1, seed: 7 });
    expect(r.parts.output).toBeGreaterThan(0);
    expect(r.throughputPerHour.mean).toBeGreaterThan(0);
  });

  it.each(exampleFiles())('reports station and carrier time shares that sum to 1 (%s)', async (file) => {
    const r = await checkedRun(loadExample(file), { hours: 0.5, warmupMinutes: 5, replications: 2, seed: 3 });
    for (const s of r.stations) expect(s.processing + s.starved + s.blocked + s.down + s.onBreak).toBeCloseTo(1, 9);
    const c = r.carriers;
    expect(c.moving + c.waiting + c.working + c.inTransfer).toBeCloseTo(1, 9);
    for (const st of r.heatmaps.stations) {
      for (let t = 0; t < r.heatmaps.timeBins; t++) {
        const row = st.shares.slice(t * 5, t * 5 + 5).reduce((a, b) => a + b, 0);
        expect(row).toBeCloseTo(1, 3);
      }
    }
  });

  it('a blocked station resumes when space frees', async () => {
    // A fast press feeds a slow station directly, with no room between them: the press finishes in
    // 1 s and then holds its carrier until the slow station lets its own carrier go.
    const doc = serialLine({
      stations: [{ cycle: fixed(1) }, { cycle: fixed(1) }, { cycle: fixed(10) }, { cycle: fixed(1) }],
      carriers: 4,
    });
    const r = await checkedRun(doc, { hours: 1, warmupMinutes: 10, replications: 1, seed: 1 });
    const press = r.stations[1];
    expect(press.blocked).toBeGreaterThan(0.5);
    // Were the press never released, nothing would reach unloading; it is, once per slow cycle.
    expect(r.throughputPerHour.mean).toBeGreaterThan(340);
    expect(r.throughputPerHour.mean).toBeLessThanOrEqual(360 + 1);
    expect(r.bottleneckStationId).toBe('S3');
    // The slow station is never waiting for the others except while its next carrier moves in,
    // so the active-period method names it the sole bottleneck nearly all the time.
    expect(r.stations[2].soleBottleneckShare).toBeGreaterThan(0.95);
    expect(r.stations[1].bottleneckShare).toBeLessThan(0.05);
  });

  it('a deterministic line makes one part per cycle of its slowest station once warmed up', async () => {
    const doc = serialLine({
      stations: [{ cycle: fixed(4) }, { cycle: fixed(8), bufferBefore: 3 }, { cycle: fixed(2), bufferBefore: 3 }],
      carriers: 8,
    });
    const r = await checkedRun(doc, { hours: 1, warmupMinutes: 10, replications: 1, seed: 1 });
    expect(Math.abs(r.parts.output - 450)).toBeLessThanOrEqual(1);
    expect(r.stations[1].processing).toBeGreaterThan(0.99);
  });

  it('warm-up deletion drops the start-up transient from every statistic', async () => {
    // Carriers start empty at the far end; the first part needs a full loop before it is unloaded.
    const doc = serialLine({ stations: [{ cycle: fixed(5) }, { cycle: fixed(10) }, { cycle: fixed(5) }], carriers: 6 });
    const cold = await checkedRun(doc, { hours: 0.1, warmupMinutes: 0, replications: 1, seed: 1 });
    const warm = await checkedRun(doc, { hours: 0.1, warmupMinutes: 10, replications: 1, seed: 1 });
    expect(Math.abs(warm.parts.output - 36)).toBeLessThanOrEqual(1);
    expect(cold.parts.output).toBeLessThan(warm.parts.output);
    expect(warm.stations[1].processing).toBeGreaterThan(0.98);
    expect(cold.stations[1].starved).toBeGreaterThan(warm.stations[1].starved);
  });

  it('a manual station pauses for exactly the calendar breaks', async () => {
    const doc = serialLine({
      stations: [{ cycle: fixed(5) }, { cycle: fixed(6), pausesForBreaks: true }, { cycle: fixed(5) }],
      carriers: 4,
      breaks: [{ startMinute: 60, minutes: 30 }],
      hoursPerShift: 4,
    });
    const r = await checkedRun(doc, { hours: 4, warmupMinutes: 0, replications: 1, seed: 1 });
    expect(r.stations[1].onBreak).toBeCloseTo(30 / 240, 9);
    expect(r.stations[0].onBreak).toBe(0);
  });

  it('conserves parts: loaded = output + scrapped + change in WIP', async () => {
    const doc = loadExample('stacked-loop.json');
    const r = await checkedRun(doc, { hours: 1, warmupMinutes: 0, replications: 1, seed: 11 });
    // The line starts empty, so WIP at the end is what was loaded and has not left.
    const wipEnd = r.wip.series.values[r.wip.series.values.length - 1];
    expect(r.parts.loaded - r.parts.output - r.parts.scrapped).toBeGreaterThanOrEqual(0);
    expect(r.parts.loaded - r.parts.output - r.parts.scrapped).toBeLessThanOrEqual(r.carriers.count);
    expect(wipEnd).toBeGreaterThan(0);
  });

  it('stops a line that locks up with a gridlock report naming every carrier', async () => {
    // Every place on the track is taken: no carrier can ever move on.
    const doc = serialLine({ stations: [{ cycle: fixed(1) }, { cycle: fixed(1) }], carriers: 5, returnPlaces: 2 });
    const error = await runExperiment(doc, { hours: 1, warmupMinutes: 0, replications: 1 }).catch((e: unknown) => e);
    expect(isSimulationStopped(error)).toBe(true);
    if (!isSimulationStopped(error)) return;
    expect(error.reason).toBe('gridlock');
    expect(error.gridlock).toHaveLength(5);
    for (const entry of error.gridlock) {
      expect(entry.at).toMatch(/lane "(work|return)"/);
      expect(entry.waitingFor.length).toBeGreaterThan(0);
    }
  });
});

describe('dispatch', () => {
  function parallelPositions(dispatch: 'pooled' | 'shortestQueue' | 'firstFree') {
    const doc = serialLine({
      stations: [{ cycle: fixed(1) }, { cycle: fixed(20) }, { cycle: fixed(1), bufferBefore: 2 }],
      carriers: 6,
    });
    const step = doc.steps[1];
    step.dispatch = dispatch;
    step.stations.push({
      ...step.stations[0],
      id: 'S2b',
      name: 'Station S2b',
      positionMm: step.stations[0].positionMm + 100,
    });
    return doc;
  }

  it('shortest queue sends the leading carrier to the further of two parallel positions, so both work', async () => {
    const r = await checkedRun(parallelPositions('shortestQueue'), { hours: 1, warmupMinutes: 10, replications: 1 });
    // Two 20 s positions side by side on one lane make a part every 10 s.
    expect(r.throughputPerHour.mean).toBeGreaterThan(340);
    for (const s of r.stations.filter((st) => st.stepId === 'step-S2')) expect(s.processing).toBeGreaterThan(0.95);
  });

  it('pooled decides at the first of two parallel positions on a lane, so both work', async () => {
    const r = await checkedRun(parallelPositions('pooled'), { hours: 1, warmupMinutes: 10, replications: 1 });
    expect(r.throughputPerHour.mean).toBeGreaterThan(340);
    for (const s of r.stations.filter((st) => st.stepId === 'step-S2')) expect(s.processing).toBeGreaterThan(0.95);
  });

  it('a document without a dispatch rule pools its parallel stations', () => {
    const doc = parallelPositions('pooled') as { steps: Record<string, unknown>[] };
    delete doc.steps[1].dispatch;
    const checked = validateScenario(doc);
    expect(checked.ok && checked.scenario.steps[1].dispatch).toBe('pooled');
  });

  it('first free fills stations in the order listed, even when the first blocks the way to the second', async () => {
    const r = await checkedRun(parallelPositions('firstFree'), { hours: 1, warmupMinutes: 10, replications: 1 });
    const [upstream, downstream] = r.stations.filter((st) => st.stepId === 'step-S2');
    expect(upstream.processing).toBeGreaterThan(downstream.processing);
  });
});
