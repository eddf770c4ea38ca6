// The comparison's numbers on real engine results: runs with one seed are paired, others fall back to
// Welch and say so; a clearly faster bottleneck is found significant and named in the answer; steps and
// heatmaps line up across layouts.
import { beforeAll, describe, expect, it } from 'vitest';
import sideBySideLoop from '../../../shared/examples/side-by-side-loop.json';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import type { RunResult } from '../../../shared/results/run-result';
import { runExperiment } from '../../../workers/engine';
import { pairedDifference } from '../../../workers/analysis/compare-means';
import { answerOf } from '../../../src/features/compare/utils/answer';
import { compareRuns, type ComparedRun } from '../../../src/features/compare/utils/comparison';
import { heatmapGroups } from '../../../src/features/compare/utils/heatmap-lanes';
import { alignSteps } from '../../../src/features/compare/utils/steps';

const SETTINGS = { hours: 1, warmupMinutes: 10, replications: 5, seed: 31 };

/** The stacked example with the bottleneck press cut from 9 s to 6 s: it must make clearly more. */
function fasterPress() {
  const doc = structuredClone(stackedLoop) as typeof stackedLoop;
  const press = doc.steps.find((s) => s.id === 'press')!.stations[0];
  press.cycleTimeSeconds = { kind: 'fixed', value: 6 } as typeof press.cycleTimeSeconds;
  return doc;
}

let stacked: RunResult;
let sideBySide: RunResult;
let faster: RunResult;
let otherSeed: RunResult;

beforeAll(async () => {
  const now = () => performance.now();
  [stacked, sideBySide, faster, otherSeed] = await Promise.all([
    runExperiment(stackedLoop, SETTINGS, { now }),
    runExperiment(sideBySideLoop, SETTINGS, { now }),
    runExperiment(fasterPress(), SETTINGS, { now }),
    runExperiment(sideBySideLoop, { ...SETTINGS, seed: 32 }, { now }),
  ]);
}, 120_000);

const run = (id: string, label: string, result: RunResult): ComparedRun => ({ id, label, result });

describe('comparing runs', () => {
  it('pairs runs with one seed and replication count, replication by replication', () => {
    const comparison = compareRuns([run('a', 'Stacked', stacked), run('b', 'Side by side', sideBySide)]);
    expect(comparison.pairing).toBe('paired');
    expect(comparison.pairingNote).toBeNull();
    const expected = pairedDifference(
      stacked.replications.map((r) => r.throughputPerHour),
      sideBySide.replications.map((r) => r.throughputPerHour),
    );
    expect(comparison.figures[1].differences?.throughputPerHour).toEqual(expected);
    expect(comparison.figures[0].differences).toBeNull();
    // The headline intervals are the engine's own for throughput; WIP's comes from the replications.
    expect(comparison.figures[0].values.throughputPerHour).toEqual(stacked.throughputPerHour);
    expect(comparison.figures[0].values.wip.mean).toBeCloseTo(stacked.wip.mean, 6);
  });

  it('compares runs with another seed as independent samples and says why', () => {
    const comparison = compareRuns([run('a', 'Stacked', stacked), run('b', 'Side by side, seed 32', otherSeed)]);
    expect(comparison.pairing).toBe('independent');
    expect(comparison.pairingNote).toMatch(/Side by side, seed 32 was run with another seed.*Welch/);
    expect(comparison.figures[1].differences?.throughputPerHour.method).toBe('welch');
  });

  it('finds a much faster bottleneck significant and names it in the answer, with costs', () => {
    const comparison = compareRuns([run('a', 'Stacked', stacked), run('b', 'Faster press', faster)]);
    const d = comparison.figures[1].differences!.throughputPerHour;
    expect(d.significant).toBe(true);
    expect(d.difference).toBeGreaterThan(0);
    const costs = new Map([
      ['a', { capitalCost: 400_000, perHourlyPart: 1200, currency: 'EUR' }],
      ['b', { capitalCost: 410_000, perHourlyPart: 900, currency: 'EUR' }],
    ]);
    const answer = answerOf(
      comparison,
      costs,
      new Map([
        ['a', 1.6],
        ['b', 1.6],
      ]),
    );
    expect(answer.winnerId).toBe('b');
    expect(answer.sentence).toMatch(
      /^Faster press makes more: .* parts\/h more \(95 % paired interval .*\), a significant difference\. Capital cost: Faster press EUR 410,000 \(EUR 900 per part\/h\) against Stacked EUR 400,000/,
    );
    expect(answer.sentence).toMatch(/Floor area: Faster press 1\.6 m² against Stacked 1\.6 m²\.$/);
  });

  it('says when there are no prices instead of guessing costs', () => {
    const answer = answerOf(compareRuns([run('a', 'Stacked', stacked), run('b', 'Faster press', faster)]));
    expect(answer.sentence).toMatch(/No price list is set/);
  });

  it('refuses fewer than two or more than four runs', () => {
    expect(() => compareRuns([run('a', 'Stacked', stacked)])).toThrow(/compare 2 to 4 runs/);
    expect(() => compareRuns(Array.from({ length: 5 }, (_, i) => run(String(i), `Run ${i}`, stacked)))).toThrow(
      /got 5/,
    );
  });
});

describe('aligning what the runs drew', () => {
  it('lines up station states by step, each step’s shares adding up to one', () => {
    const rows = alignSteps([stacked, sideBySide], new Map([['press', 'Press seat ring']]));
    expect(rows.map((r) => r.stepId)).toEqual(['load', 'press', 'screw', 'fit', 'leak', 'unload']);
    expect(rows[1].name).toBe('Press seat ring');
    expect(rows[3].shares[0]?.stations).toBe(2);
    for (const row of rows) {
      for (const s of row.shares)
        expect(s!.processing + s!.starved + s!.blocked + s!.down + s!.onBreak).toBeCloseTo(1, 3);
    }
  });

  it('puts every lane of runs with equal time bins on one heatmap, named by run', () => {
    const groups = heatmapGroups([
      { label: 'Stacked', result: stacked },
      { label: 'Side by side', result: sideBySide },
    ]);
    expect(groups).toHaveLength(1);
    expect(groups[0].lanes.map((l) => l.laneName)).toEqual([
      'Stacked: Work lane',
      'Stacked: Return lane',
      'Side by side: Work lane',
      'Side by side: Return lane',
    ]);
  });
});
