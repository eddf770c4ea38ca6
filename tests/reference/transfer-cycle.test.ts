// A transfer that paces a line: it holds one carrier at a time, so with carriers always waiting its
// cycle sets the throughput. The cycles are the line model's stated assumptions for each kind, the
// usual way such units are specified (common trade practice): an elevator takes handlingSeconds to
// move the carrier on and off plus the lift up and back at liftSpeed; a lateral transfer likewise
// with its shift; a curve is run through at its speed limit and needs no return. Elevators and
// lateral transfers take the next carrier as soon as they are back, because it has already moved up
// to the lane end during the cycle (one pitch at the loaded profile, 0.28 s here).
import { describe, expect, it } from 'vitest';
import { DECK_DROP_MM, loopScenario, type LoopJoin, type LoopLine } from './support/loop-line';
import { trapezoidMoveSeconds } from './support/queueing';
import { simulate } from './support/run';
import { transferShares } from '../../shared/results/run-result';

const CARRIERS = { count: 12, lengthMm: 160, minGapMm: 40, vMaxMmPerS: 2_000, aMaxMmPerS2: 10_000 };
const FAST_RETURN: LoopJoin = { kind: 'curve', lengthMm: 300, speedLimitMmPerS: 1_000 };

function line(joins: [LoopJoin, LoopJoin]): LoopLine {
  return {
    laneLengthsMm: [4_000, 4_000],
    joins,
    stations: [
      { id: 'LD', lane: 0, positionMm: 1_000, cycle: { kind: 'fixed', value: 1 } },
      { id: 'PR', lane: 0, positionMm: 2_000, cycle: { kind: 'fixed', value: 2 } },
      { id: 'UL', lane: 0, positionMm: 3_000, cycle: { kind: 'fixed', value: 1 } },
    ],
    carriers: CARRIERS,
  };
}

async function throughput(spec: LoopLine): Promise<number> {
  const result = await simulate(loopScenario(spec), { hours: 2, warmupMinutes: 15, replications: 1, seed: 'transfer' });
  return result.throughputPerHour.mean;
}

describe('a transfer that paces the line sets its throughput (common trade practice)', () => {
  it('elevator: handling 2 s + lift 400 mm at 200 mm/s up and back = 6 s, 600 parts/h', async () => {
    const lift = DECK_DROP_MM / 200;
    const cycle = 2 + 2 * lift;
    const th = await throughput(
      line([
        { kind: 'elevator', handlingSeconds: 2, liftSpeedMmPerS: 200 },
        { kind: 'elevator', handlingSeconds: 0.5, liftSpeedMmPerS: 2_000 },
      ]),
    );
    expect(Math.abs(th / (3600 / cycle) - 1)).toBeLessThan(0.005);
  }, 60_000);

  it('lateral transfer: handling 1.5 s + 600 mm at 300 mm/s there and back = 5.5 s, 654.5 parts/h', async () => {
    const cycle = 1.5 + 2 * (600 / 300);
    const th = await throughput(
      line([{ kind: 'lateral', handlingSeconds: 1.5, shiftDistanceMm: 600, shiftSpeedMmPerS: 300 }, FAST_RETURN]),
    );
    expect(Math.abs(th / (3600 / cycle) - 1)).toBeLessThan(0.005);
  }, 60_000);

  it('curve: 1500 mm at 500 mm/s = 3 s per carrier, longer than the 0.28 s move-up, 1200 parts/h', async () => {
    expect(trapezoidMoveSeconds(200, 2_000, 10_000)).toBeLessThan(3);
    const th = await throughput(line([{ kind: 'curve', lengthMm: 1_500, speedLimitMmPerS: 500 }, FAST_RETURN]));
    expect(Math.abs(th / (3600 / 3) - 1)).toBeLessThan(0.005);
  }, 60_000);
});

describe('what a transfer reports: carrying, returning empty, blocked, idle', () => {
  const SLOW: LoopJoin = { kind: 'elevator', handlingSeconds: 2, liftSpeedMmPerS: 200 };
  const QUICK: LoopJoin = { kind: 'elevator', handlingSeconds: 0.5, liftSpeedMmPerS: 2_000 };

  it('a pacing elevator carries (2 s + 2 s lift) / 6 s of the time, returns 2 s / 6 s, and holds the line', async () => {
    const r = await simulate(loopScenario(line([SLOW, QUICK])), {
      hours: 2,
      warmupMinutes: 15,
      replications: 1,
      seed: 'transfer',
    });
    const pacing = transferShares(r.transfers[0]);
    expect(pacing.carrying).toBeCloseTo(4 / 6, 2);
    expect(pacing.returning).toBeCloseTo(2 / 6, 2);
    expect(pacing.blocked).toBeLessThan(0.01);
    expect(pacing.busy).toBeCloseTo((pacing.carrying ?? 0) + (pacing.returning ?? 0), 12);
    expect((pacing.carrying ?? 0) + (pacing.returning ?? 0) + pacing.blocked + pacing.idle).toBeCloseTo(1, 9);
    expect(r.bottleneckTransferId).toBe('join-0');
    expect(r.transfers[0].bottleneckShare ?? 0).toBeGreaterThan(
      Math.max(...r.stations.map((st) => st.bottleneckShare)),
    );
  }, 60_000);

  it('an elevator kept waiting by a slow station is blocked, and the station, not the elevator, holds the line', async () => {
    const spec = line([QUICK, QUICK]);
    spec.stations = [
      { id: 'LD', lane: 0, positionMm: 400, cycle: { kind: 'fixed', value: 1 } },
      { id: 'PR', lane: 0, positionMm: 800, cycle: { kind: 'fixed', value: 12 } },
      { id: 'UL', lane: 0, positionMm: 3_000, cycle: { kind: 'fixed', value: 1 } },
    ];
    const r = await simulate(loopScenario(spec), { hours: 2, warmupMinutes: 15, replications: 1, seed: 'transfer' });
    const feeding = transferShares(r.transfers[1]);
    expect(feeding.blocked).toBeGreaterThan(0.5);
    expect(feeding.busy).toBeLessThan(0.3);
    expect(r.transfers[1].utilisation).toBeGreaterThan(0.8);
    expect(r.bottleneckTransferId).toBeNull();
    expect(r.bottleneckStationId).toBe('PR');
  }, 60_000);
});
