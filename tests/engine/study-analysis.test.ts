// The pure parts of studies: point changes, the job plan, the carrier grid and range, the sizing
// recommendation in words, and the paired comparison of points.
import { describe, expect, it } from 'vitest';
import { studyJobs, pendingJobs } from '../../shared/api/studies';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { applyPointChanges } from '../../shared/studies/point-changes';
import { sweepableFields } from '../../shared/studies/sweepable-fields';
import type { ReplicationFigures } from '../../shared/studies/replication-summary-json';
import { trackCapacity } from '../../workers/engine';
import { rangeValues, sweepPoints } from '../../workers/studies/build-points';
import {
  carrierGrid,
  defaultCarrierRange,
  recommendCarriers,
  type SizingPoint,
} from '../../workers/studies/carrier-sizing';
import { pairedDifference, type PointStatistics } from '../../workers/studies/point-statistics';
import { loadExample } from './helpers';

const ID = '00000000-0000-4000-8000-00000000000a';

function point(
  carriers: number,
  throughput: number,
  leadSeconds: number,
  shares: number[] = [0.1, 0.8, 0.1],
  relativeHalfWidth = 0.001,
): SizingPoint {
  const ci = (mean: number) => {
    const halfWidth = mean * relativeHalfWidth;
    return { mean, ciLow: mean - halfWidth, ciHigh: mean + halfWidth, halfWidth, n: 5 };
  };
  return {
    carriers,
    stats: {
      index: carriers,
      label: `${carriers}`,
      state: 'done',
      message: null,
      replications: [],
      throughput: ci(throughput),
      wip: ci(carriers),
      leadSeconds: ci(leadSeconds),
      bottleneckShares: shares,
    },
  };
}

describe('point changes', () => {
  const doc = loadExample('stacked-loop.json');

  it('sets a number and scales a distribution without touching the original', () => {
    const fields = sweepableFields(scenarioSchema.parse(doc));
    const cycle = fields.find((f) => f.path.startsWith('steps.1.stations.0.cycleTimeSeconds'))!;
    const changed = applyPointChanges(doc, [
      { path: 'carriers.count', op: 'set', value: 9 },
      { path: 'steps.1.stations.0.cycleTimeSeconds', op: 'scale', value: 0.5 },
    ]);
    expect(changed.ok).toBe(true);
    if (!changed.ok) return;
    const after = scenarioSchema.parse(changed.document);
    expect(after.carriers.count).toBe(9);
    const key = cycle.path.split('.').at(-1)!;
    expect((after.steps[1].stations[0].cycleTimeSeconds as unknown as Record<string, number>)[key]).toBeCloseTo(
      cycle.value * (key === 'cv' || key === 'k' ? 1 : 0.5),
    );
    expect((doc.carriers as { count: number }).count).not.toBe(9);
  });

  it('names a path the scenario does not have', () => {
    expect(applyPointChanges(doc, [{ path: 'carriers.colour', op: 'set', value: 1 }])).toEqual({
      ok: false,
      path: 'carriers.colour',
      message: 'the scenario has no field carriers.colour',
    });
    expect(applyPointChanges(doc, [{ path: 'steps.0.name', op: 'set', value: 1 }])).toMatchObject({
      ok: false,
      message: 'steps.0.name is not a number, so it cannot be set',
    });
  });

  it('lists carrier count, motion, every station time and elevators as sweepable', () => {
    const fields = sweepableFields(scenarioSchema.parse(doc));
    const paths = fields.map((f) => f.path);
    expect(paths).toContain('carriers.count');
    expect(paths).toContain('carriers.loaded.vMaxMmPerS');
    expect(paths.some((p) => /^transfers\.\d+\.liftSpeedMmPerS$/.test(p))).toBe(true);
    for (const f of fields) expect(applyPointChanges(doc, [{ path: f.path, op: 'set', value: f.value }]).ok).toBe(true);
  });
});

describe('the job plan', () => {
  const study = {
    id: ID,
    settings: { hours: 1, warmupMinutes: 0, replications: 5, seed: 3 },
    blockSize: 2,
    commonRandomNumbers: true,
    points: [0, 1].map((index) => ({ index, label: `p${index}`, revisionId: ID, changes: [] })),
  };

  it('cuts each point into blocks; the last takes the remainder; common random numbers share the seed', () => {
    const jobs = studyJobs(study);
    expect(jobs.map((j) => [j.pointIndex, j.first, j.count])).toEqual([
      [0, 0, 2],
      [0, 2, 2],
      [0, 4, 1],
      [1, 0, 2],
      [1, 2, 2],
      [1, 4, 1],
    ]);
    expect(new Set(jobs.map((j) => j.settings.seed))).toEqual(new Set([3]));
    expect(new Set(studyJobs({ ...study, commonRandomNumbers: false }).map((j) => j.settings.seed)).size).toBe(2);
    expect(JSON.parse(JSON.stringify(jobs))).toEqual(jobs);
  });

  it('leaves out jobs that have a result', () => {
    const results = [{ pointIndex: 0, first: 2, count: 2, outcome: 'done' as const, message: null, figures: [] }];
    expect(pendingJobs({ ...study, results }).map((j) => `${j.pointIndex}:${j.first}`)).toEqual([
      '0:0',
      '0:4',
      '1:0',
      '1:2',
      '1:4',
    ]);
  });
});

describe('carrier range and grid', () => {
  it('takes the smallest whole step that keeps to about twenty counts, always ending at the top', () => {
    expect(carrierGrid(4, 12)).toEqual([4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(carrierGrid(7, 82)).toEqual([7, 11, 15, 19, 23, 27, 31, 35, 39, 43, 47, 51, 55, 59, 63, 67, 71, 75, 79, 82]);
    expect(carrierGrid(7, 82, 8)).toEqual([7, 18, 29, 40, 51, 62, 73, 82]);
    expect(carrierGrid(10, 10)).toEqual([10]);
  });

  it('runs from one carrier per station to one fewer than the smallest loop holds, below gridlock', () => {
    const s = scenarioSchema.parse(loadExample('stacked-loop.json'));
    const stations = s.steps.reduce((n, step) => n + step.stations.length, 0);
    // Two 8 m lanes at a 200 mm pitch hold 40 carriers each, and each elevator one: 82 lock the loop.
    expect(trackCapacity(s)).toBe(82);
    expect(defaultCarrierRange(s)).toEqual({ low: stations, high: 81 });
  });

  it('range values are evenly spaced and whole when asked', () => {
    expect(rangeValues(1, 2, 5)).toEqual([1, 1.25, 1.5, 1.75, 2]);
    expect(rangeValues(4, 9, 4, true)).toEqual([4, 6, 7, 9]);
    expect(
      sweepPoints([
        { path: 'a', label: 'A', values: [1, 2] },
        { path: 'b', label: 'B', values: [3, 4] },
      ]).map((p) => p.label),
    ).toEqual(['A 1, B 3', 'A 1, B 4', 'A 2, B 3', 'A 2, B 4']);
  });
});

describe('carrier recommendation', () => {
  const curve = [point(6, 100, 60), point(10, 160, 70), point(14, 198, 80), point(18, 199.5, 87.2), point(22, 200, 95)];

  it('picks the smallest count within the tolerance of the best and says what more would cost', () => {
    const advice = recommendCarriers(curve, null, ['LD', 'Press', 'UL']);
    expect(advice).toMatchObject({ kind: 'recommend', carriers: 14, best: 22 });
    expect(advice.text).toBe(
      '14 carriers make 198.0 parts/h, within 1 % of the best (200.0 parts/h at 22 carriers). Beyond 14 carriers throughput rises by 1.0 % while lead time grows 19 % (at 22).',
    );
  });

  it('with a target, the smallest count within tolerance that also meets it', () => {
    expect(recommendCarriers(curve, 199, ['LD', 'Press', 'UL'])).toMatchObject({
      kind: 'recommend',
      carriers: 18,
      meetsTarget: true,
    });
    expect(recommendCarriers(curve, 150, ['LD', 'Press', 'UL'], 0.2)).toMatchObject({
      kind: 'recommend',
      carriers: 10,
      meetsTarget: true,
    });
  });

  it('says plainly when no count reaches the target and which station limits the line', () => {
    const advice = recommendCarriers(curve, 240, ['LD', 'Press', 'UL']);
    expect(advice).toMatchObject({ kind: 'unreachable', best: 22, limitingStation: 'Press' });
    expect(advice.text).toBe(
      'No carrier count reaches the target of 240.0 parts/h: the most is 200.0 parts/h at 22 carriers. Station Press limits the line: it is the bottleneck 80 % of the time at 22 carriers, so more carriers cannot help; shorten its cycle time or add a station beside it.',
    );
  });

  it('blames transport, not a station, when no station is the bottleneck most of the time', () => {
    const elevatorBound = curve.map((p) => point(p.carriers, p.stats.throughput!.mean, 60, [0.09, 0.06, 0.02]));
    const advice = recommendCarriers(elevatorBound, 240, ['LD', 'Press', 'UL']);
    expect(advice).toMatchObject({ kind: 'unreachable', limitingStation: 'LD' });
    expect(advice.text).toMatch(
      /No station is the bottleneck most of the time \(the most often is LD, 9 % at 22 carriers\), so transport limits the line/,
    );
  });

  it('on a tie for the best, names the fewer carriers: they cost less', () => {
    // 20 carriers lie inside the 95 % interval of the highest mean (at 30): a tie, so 20 is named.
    const tied = [10, 20, 30].map((n, i) => point(n, [150, 199.5, 200][i], 60 + i * 10, undefined, 0.005));
    const unreachable = recommendCarriers(tied, 240, ['LD', 'Press', 'UL']);
    expect(unreachable).toMatchObject({ kind: 'unreachable', best: 20, bestThroughput: 200 });
    expect(unreachable.text).toMatch(
      /the most is 200\.0 parts\/h, reached within its 95 % interval from 20 carriers\./,
    );
    expect(recommendCarriers(tied, null, [])).toMatchObject({ kind: 'recommend', carriers: 20, best: 20 });
    // Exactly equal throughput (a deterministic line has no spread): the smaller count again.
    const equal = [point(22, 200, 95, undefined, 0), point(14, 200, 80, undefined, 0)];
    expect(recommendCarriers(equal, 240, [])).toMatchObject({ kind: 'unreachable', best: 14 });
    // Outside the interval it is no tie: the larger count makes more and is named.
    const apart = [point(20, 190, 70, undefined, 0.005), point(30, 200, 80, undefined, 0.005)];
    expect(recommendCarriers(apart, 240, [])).toMatchObject({ best: 30 });
  });

  it('skips points that failed and says when nothing has finished', () => {
    const failed = {
      ...point(30, 999, 1),
      stats: { ...point(30, 999, 1).stats, state: 'stopped' as const, message: 'gridlock' },
    };
    expect(recommendCarriers([...curve, failed], null, [])).toMatchObject({ carriers: 14, best: 22 });
    expect(recommendCarriers([], null, []).kind).toBe('none');
  });
});

describe('paired differences (common random numbers)', () => {
  const figures = (x: number): ReplicationFigures => ({
    throughputPerHour: x,
    wipMean: 0,
    leadMeanSeconds: 0,
    bottleneckShares: [],
  });
  const stats = (values: (number | undefined)[]): PointStatistics => ({
    index: 0,
    label: '',
    state: 'done',
    message: null,
    replications: values.map((v) => (v === undefined ? undefined : figures(v))),
    throughput: null,
    wip: null,
    leadSeconds: null,
    bottleneckShares: [],
  });

  it('pairs replication by replication, so shared noise cancels (Law 2015, §10.2.1)', () => {
    // Differences 2, 2, 2.5, 1.5: mean 2, sd 0.408, t(0.975, 3) = 3.182, half-width 0.6495.
    const d = pairedDifference(stats([10, 20, 30, 40]), stats([12, 22, 32.5, 41.5]), (f) => f.throughputPerHour)!;
    expect(d.mean).toBeCloseTo(2, 12);
    expect(d.halfWidth).toBeCloseTo(0.6495, 3);
  });

  it('uses only replications both points finished, and needs two', () => {
    expect(pairedDifference(stats([1, undefined, 3]), stats([2, 5, 4]), (f) => f.throughputPerHour)!.n).toBe(2);
    expect(pairedDifference(stats([1]), stats([2]), (f) => f.throughputPerHour)).toBeNull();
  });
});
