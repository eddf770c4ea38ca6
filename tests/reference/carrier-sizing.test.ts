// Carrier-sizing studies against closed-queueing-network results, run through the study path
// (points, jobs, job runner, per-point statistics, recommendation):
// - a balanced loop with fixed times follows the best case TH(N) = min(N / T0, r_b) and its knee lies
//   at the critical WIP W0 = r_b · T0 (Hopp & Spearman, Factory Physics, 3rd ed. 2008, ch. 7 "Basic
//   Factory Dynamics", best-case performance and critical WIP);
// - a loop of exponential stations follows exact Mean Value Analysis within the replication interval
//   (Reiser & Lavenberg, J. ACM 27(2), 1980).
// The geometry is the one of closed-loop-mva.test.ts, where travel and exchange times are derived.
import { describe, expect, it } from 'vitest';
import type { Distribution } from '../../shared/scenario/distribution';
import { carrierSizingPoints } from '../../workers/studies/build-points';
import { recommendCarriers } from '../../workers/studies/carrier-sizing';
import { pointStatistics } from '../../workers/studies/point-statistics';
import { runStudyLocally } from '../../workers/studies/run-study-locally';
import { loopScenario, type LoopLine } from './support/loop-line';
import { mvaThroughput, trapezoidMoveSeconds } from './support/queueing';
import { interval } from './support/run';

const V = 20_000;
const A = 100_000_000;
const LENGTH = 5;
const REVISION = '00000000-0000-4000-8000-000000000001';

function line(cycles: Distribution[]): LoopLine {
  return {
    laneLengthsMm: [60_000, 60_000],
    stations: ['LD', 'P1', 'P2', 'UL'].map(
      (id, i) =>
        ({
          id,
          lane: i < 3 ? 0 : 1,
          positionMm: [1_000, 20_000, 40_000, 30_000][i],
          cycle: cycles[i],
        }) as LoopLine['stations'][number],
    ),
    carriers: { count: 1, lengthMm: LENGTH, minGapMm: 0, vMaxMmPerS: V, aMaxMmPerS2: A },
  };
}

const LOOP_MOVES_MM = [
  20_000 - 1_000,
  40_000 - 20_000,
  60_000 - 40_000,
  30_000 - LENGTH,
  60_000 - 30_000,
  1_000 - LENGTH,
];
const TRAVEL_SECONDS = LOOP_MOVES_MM.reduce((sum, d) => sum + trapezoidMoveSeconds(d, V, A), 0);

async function sizingStudy(
  cycles: Distribution[],
  counts: number[],
  settings: { hours: number; warmupMinutes: number; replications: number; seed: string },
) {
  const points = carrierSizingPoints(counts).map((p, index) => ({
    index,
    label: p.label,
    revisionId: REVISION,
    changes: p.changes ?? [],
  }));
  const study = await runStudyLocally(
    { id: 'reference', settings, commonRandomNumbers: true, blockSize: settings.replications, points },
    { [REVISION]: loopScenario(line(cycles)) },
  );
  return pointStatistics(study).map((stats, i) => ({ carriers: counts[i], stats }));
}

describe('balanced deterministic loop (Hopp & Spearman 2008, ch. 7, best case)', () => {
  const t = 2.5;
  const exchange = trapezoidMoveSeconds(LENGTH, V, A);
  const rb = 1 / (t + exchange);
  const T0 = 4 * t + TRAVEL_SECONDS;
  const W0 = rb * T0;
  const counts = [1, 2, 3, 4, 5, 6, 7, 8, 9, 10];

  it('throughput follows min(N / T0, r_b) within 0.5 %, and the recommended count is the critical WIP rounded up', async () => {
    expect(W0).toBeGreaterThan(6);
    expect(W0).toBeLessThan(7);
    const sized = await sizingStudy(
      [0, 1, 2, 3].map(() => ({ kind: 'fixed', value: t })),
      counts,
      { hours: 2, warmupMinutes: 20, replications: 2, seed: 'best-case' },
    );
    for (const { carriers, stats } of sized) {
      expect(stats.state).toBe('done');
      const bestCase = Math.min(carriers / T0, rb) * 3600;
      expect(
        Math.abs(stats.throughput!.mean / bestCase - 1),
        `${carriers} carriers: ${stats.throughput!.mean} against ${bestCase}`,
      ).toBeLessThan(0.005);
    }
    const advice = recommendCarriers(sized, null, ['LD', 'P1', 'P2', 'UL']);
    expect(advice).toMatchObject({ kind: 'recommend', carriers: Math.ceil(W0) });
  }, 120_000);
});

describe('exponential loop against exact MVA (Reiser & Lavenberg 1980)', () => {
  const means = [1.5, 3, 2.5, 2];
  const counts = [2, 4, 6, 8];

  it('each count within its replication interval of MVA (Bonferroni over the four counts)', async () => {
    const exact = mvaThroughput(means, TRAVEL_SECONDS, 8).map((x) => x * 3600);
    const sized = await sizingStudy(
      means.map((mean) => ({ kind: 'exponential', mean })),
      counts,
      { hours: 6, warmupMinutes: 30, replications: 10, seed: 'mva-study' },
    );
    for (const { carriers, stats } of sized) {
      const ci = interval(
        stats.replications.map((f) => f!.throughputPerHour),
        1 - 0.05 / counts.length,
      );
      expect(ci.halfWidth / ci.mean).toBeLessThan(0.02);
      expect(exact[carriers - 1]).toBeGreaterThanOrEqual(ci.low);
      expect(exact[carriers - 1]).toBeLessThanOrEqual(ci.high);
    }
  }, 180_000);
});
