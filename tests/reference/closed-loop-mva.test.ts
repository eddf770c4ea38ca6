// A closed loop of exponential single-server stations and N carriers against exact Mean Value
// Analysis (Reiser & Lavenberg, "Mean-value analysis of closed multichain queuing networks", J. ACM
// 27(2), 1980). Carriers are the customers, the four stations FCFS exponential servers, and the
// track between them one infinite-server delay node whose time is the loop's travel time.
//
// What is service and what is travel: service is the station's sampled cycle time only. Travel is
// every move along the track, computed below from the trapezoidal profile, lane by lane (a carrier
// stops at each lane end; a direct link puts it on the next lane with its whole length on the lane,
// so each link skips one carrier length of track). The physical effects that a product-form network
// does not have are made negligible by design: 5 mm carriers at 20 m/s and 10^8 mm/s² need 0.45 ms
// to close up one place (the exchange at a station, under 0.03 % of any mean cycle time); queues of
// at most 8 carriers take 40 mm, far from the previous station, so they never block it; all
// carriers travel with one profile, so travel order never changes and no carrier delays another
// on the way (a deterministic delay node is allowed: infinite-server nodes are insensitive to the
// distribution, Baskett, Chandy, Muntz & Palacios, J. ACM 22(2), 1975).
import { describe, expect, it } from 'vitest';
import { loopScenario, type LoopLine } from './support/loop-line';
import { mvaThroughput, trapezoidMoveSeconds } from './support/queueing';
import { interval, replicationThroughputs, simulate } from './support/run';

const V = 20_000;
const A = 100_000_000;
const LENGTH = 5;
const MEANS = [1.5, 3, 2.5, 2];
const MAX_N = 8;

function line(count: number): LoopLine {
  return {
    laneLengthsMm: [60_000, 60_000],
    stations: [
      { id: 'LD', lane: 0, positionMm: 1_000, cycle: { kind: 'exponential', mean: MEANS[0] } },
      { id: 'P1', lane: 0, positionMm: 20_000, cycle: { kind: 'exponential', mean: MEANS[1] } },
      { id: 'P2', lane: 0, positionMm: 40_000, cycle: { kind: 'exponential', mean: MEANS[2] } },
      { id: 'UL', lane: 1, positionMm: 30_000, cycle: { kind: 'exponential', mean: MEANS[3] } },
    ],
    carriers: { count, lengthMm: LENGTH, minGapMm: 0, vMaxMmPerS: V, aMaxMmPerS2: A },
  };
}

/** Rest-to-rest moves of one loop: LD → P1 → P2 → work-lane end | link | → UL → return-lane end | link | → LD. */
const LOOP_MOVES_MM = [
  20_000 - 1_000,
  40_000 - 20_000,
  60_000 - 40_000,
  30_000 - LENGTH,
  60_000 - 30_000,
  1_000 - LENGTH,
];
const TRAVEL_SECONDS = LOOP_MOVES_MM.reduce((sum, d) => sum + trapezoidMoveSeconds(d, V, A), 0);

describe('closed loop of exponential stations against exact MVA (Reiser & Lavenberg 1980)', () => {
  const exact = mvaThroughput(MEANS, TRAVEL_SECONDS, MAX_N).map((x) => x * 3600);

  it('the loop travel time is about 6 s, the same order as the cycle times, so the delay node matters', () => {
    expect(TRAVEL_SECONDS).toBeGreaterThan(5.9);
    expect(TRAVEL_SECONDS).toBeLessThan(6.1);
  });

  // Eight comparisons in one family: each interval at the Bonferroni level 1 − 0.05/8, so a correct
  // engine passes the whole family at least 95 % of the time whatever the seed.
  it.each(Array.from({ length: MAX_N }, (_, i) => i + 1))(
    'N = %i carriers: throughput within the replication interval of MVA',
    async (n) => {
      const result = await simulate(loopScenario(line(n)), {
        hours: 8,
        warmupMinutes: 30,
        replications: 10,
        seed: 'mva',
      });
      const ci = interval(replicationThroughputs(result), 1 - 0.05 / MAX_N);
      // The check must be able to fail: the interval is narrower than 1.5 % of the mean.
      expect(ci.halfWidth / ci.mean).toBeLessThan(0.015);
      expect(exact[n - 1]).toBeGreaterThanOrEqual(ci.low);
      expect(exact[n - 1]).toBeLessThanOrEqual(ci.high);
    },
    120_000,
  );
});
