// Comparing studies on real engine results: carrier-sizing studies of the stacked and the side-by-side
// examples with one seed are paired point by point (common random numbers); a study with another seed
// falls back to Welch; points match by what they change, whatever their order; a clearly faster
// bottleneck makes a significant difference the answer names; a stopped point is never drawn.
import { beforeAll, describe, expect, it } from 'vitest';
import sideBySideLoop from '../../../shared/examples/side-by-side-loop.json';
import stackedLoop from '../../../shared/examples/stacked-loop.json';
import type { StudyDetail } from '../../../shared/api/studies';
import { pairedDifference, welchDifference } from '../../../workers/analysis/compare-means';
import { studyAnswer } from '../../../src/features/study-compare/utils/study-answer';
import {
  compareStudies,
  labelStudies,
  pointKey,
  throughputSeries,
} from '../../../src/features/study-compare/utils/study-comparison';
import { localSizingStudy } from '../support/local-study';

const SETTINGS = { hours: 1, warmupMinutes: 10, replications: 4, seed: 7 };

/** The stacked example with the press cut from 9 s to 6 s: it must make clearly more. */
function fasterPress() {
  const doc = structuredClone(stackedLoop) as typeof stackedLoop;
  const press = doc.steps.find((s) => s.id === 'press')!.stations[0];
  press.cycleTimeSeconds = { kind: 'fixed', value: 6 } as typeof press.cycleTimeSeconds;
  return doc;
}

const sizingStudy = (n: number, name: string, doc: unknown, counts: number[], settings = SETTINGS) =>
  localSizingStudy(n, name, doc, counts, settings);

let stacked: StudyDetail;
let sideBySide: StudyDetail;
let otherSeed: StudyDetail;
let faster: StudyDetail;

beforeAll(async () => {
  [stacked, sideBySide, otherSeed, faster] = await Promise.all([
    sizingStudy(1, 'Stacked', stackedLoop, [4, 8, 14]),
    // The same counts in another order, and one count the stacked study does not have.
    sizingStudy(2, 'Side by side', sideBySideLoop, [14, 4, 8, 20]),
    sizingStudy(3, 'Side by side', sideBySideLoop, [4, 8, 14], { ...SETTINGS, seed: 8 }),
    sizingStudy(4, 'Faster press', fasterPress(), [4, 8, 14]),
  ]);
}, 120_000);

const throughputOf = (study: StudyDetail, carriers: number) => {
  const point = study.points.find((p) => p.changes[0].value === carriers)!;
  return study.results
    .filter((r) => r.pointIndex === point.index)
    .sort((a, b) => a.first - b.first)
    .flatMap((r) => r.figures.map((f) => f.throughputPerHour));
};

describe('comparing studies', () => {
  it('matches points by their changes, whatever their order in each study', () => {
    expect(pointKey([{ path: 'carriers.count', op: 'set', value: 8 }])).toBe(
      pointKey([{ path: 'carriers.count', op: 'set', value: 8 }]),
    );
    expect(pointKey([{ path: 'carriers.count', op: 'set', value: 8 }])).not.toBe(
      pointKey([{ path: 'carriers.count', op: 'scale', value: 8 }]),
    );
    const comparison = compareStudies(labelStudies([stacked, sideBySide]));
    expect(comparison.axis).toEqual({ path: 'carriers.count', label: 'Carriers' });
    expect(comparison.rows.map((r) => r.x)).toEqual([4, 8, 14, 20]);
    // 20 carriers exist only in the second study: no difference is formed there.
    expect(comparison.rows[3].cells[0]).toBeNull();
    expect(comparison.rows[3].differences[1]).toBeNull();
    expect(throughputSeries(comparison).map((s) => s.points.map((p) => p.x))).toEqual([
      [4, 8, 14],
      [4, 8, 14, 20],
    ]);
  });

  it('pairs replication r of matched points when the studies share their seed and run length', () => {
    const comparison = compareStudies(labelStudies([stacked, sideBySide]));
    expect(comparison.pairing).toBe('paired');
    for (const carriers of [4, 8, 14]) {
      const row = comparison.rows.find((r) => r.x === carriers)!;
      expect(row.differences[0]).toBeNull();
      expect(row.differences[1]).toEqual(
        pairedDifference(throughputOf(stacked, carriers), throughputOf(sideBySide, carriers)),
      );
    }
  });

  it('uses Welch’s interval for studies with another seed', () => {
    const comparison = compareStudies(labelStudies([stacked, otherSeed]));
    expect(comparison.pairing).toBe('welch');
    const row = comparison.rows.find((r) => r.x === 8)!;
    expect(row.differences[1]).toEqual(welchDifference(throughputOf(stacked, 8), throughputOf(otherSeed, 8)));
  });

  it('finds a clearly faster bottleneck significantly better and says so', () => {
    const comparison = compareStudies(labelStudies([stacked, faster]));
    const at14 = comparison.rows.find((r) => r.x === 14)!.differences[1]!;
    expect(at14.significant).toBe(true);
    expect(at14.difference).toBeGreaterThan(30);
    const answer = studyAnswer(comparison);
    expect(answer).toMatch(/Faster press makes significantly more than Stacked at [1-3][,;]/);
    expect(answer).toMatch(/95 % paired interval/);
    expect(answer).toMatch(/Most throughput: Stacked .* parts\/h \((from )?\d+ carriers.*\); Faster press/);
  });

  it('labels two studies of one scenario by their names and refuses too few or too many', () => {
    expect(labelStudies([sideBySide, otherSeed]).map((s) => s.label)).toEqual([
      'Side by side (Sizing 2)',
      'Side by side (Sizing 3)',
    ]);
    expect(() => compareStudies(labelStudies([stacked]))).toThrow(/compare 2 to 4 studies/);
    expect(() => compareStudies(labelStudies([stacked, stacked, stacked, stacked, stacked]))).toThrow(/got 5/);
  });
});
