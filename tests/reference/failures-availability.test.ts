// A station that fails runs at its availability times its rate (Buzacott & Shanthikumar, "Stochastic
// Models of Manufacturing Systems", 1993, ch. 2, single stage with operation-dependent failures;
// chapter recalled from memory). Lanewright counts time between failures on operating (processing)
// time and repairs on elapsed time, so each part costs its cycle time c, on average c·MTTR/MTBF of
// repair, and the exchange e (the next carrier moving up, during which the station cannot fail):
//   TH = 1 / (c / A + e),  A = MTBF / (MTBF + MTTR).
// With e negligible this is the textbook A / c. The second case makes e large (2 s) so that the
// formula for failures counted on elapsed time, A / (c + e), is 3 % away and would fail the check.
import { describe, expect, it } from 'vitest';
import { loopScenario, type LoopLine } from './support/loop-line';
import { trapezoidMoveSeconds } from './support/queueing';
import { interval, replicationThroughputs, simulate } from './support/run';

type Case = { cycle: number; mtbf: number; mttr: number; carriers: LoopLine['carriers']; pitch: number };

function line(k: Case): LoopLine {
  return {
    laneLengthsMm: [3_000, 3_000],
    stations: [
      { id: 'LD', lane: 0, positionMm: 1_000, cycle: { kind: 'fixed', value: 0.5 } },
      {
        id: 'FL',
        lane: 0,
        positionMm: 2_000,
        cycle: { kind: 'fixed', value: k.cycle },
        failures: {
          timeBetweenFailuresSeconds: { kind: 'exponential', mean: k.mtbf },
          timeToRepairSeconds: { kind: 'exponential', mean: k.mttr },
        },
      },
      { id: 'UL', lane: 0, positionMm: 2_800, cycle: { kind: 'fixed', value: 0.5 } },
    ],
    carriers: k.carriers,
  };
}

async function check(k: Case) {
  const result = await simulate(loopScenario(line(k)), {
    hours: 8,
    warmupMinutes: 30,
    replications: 10,
    seed: 'failures',
  });
  const availability = k.mtbf / (k.mtbf + k.mttr);
  const exchange = trapezoidMoveSeconds(k.pitch, k.carriers.vMaxMmPerS, k.carriers.aMaxMmPerS2);
  const expected = 3600 / (k.cycle / availability + exchange);
  const ci = interval(replicationThroughputs(result));
  const station = result.stations.find((s) => s.id === 'FL');
  if (!station) throw new Error('no station FL in the result');
  return { expected, ci, station, availability, exchange };
}

describe('throughput of a failing station is availability over cycle time (Buzacott & Shanthikumar 1993)', () => {
  it('fast carriers (exchange 0.45 ms): TH = A / c with c = 6 s, MTBF 120 s, MTTR 12 s', async () => {
    const k: Case = {
      cycle: 6,
      mtbf: 120,
      mttr: 12,
      pitch: 5,
      carriers: { count: 10, lengthMm: 5, minGapMm: 0, vMaxMmPerS: 20_000, aMaxMmPerS2: 100_000_000 },
    };
    const { expected, ci, station, availability } = await check(k);
    expect(ci.halfWidth / ci.mean).toBeLessThan(0.01);
    expect(expected).toBeGreaterThanOrEqual(ci.low);
    expect(expected).toBeLessThanOrEqual(ci.high);
    expect(Math.abs(expected / ((3600 * availability) / k.cycle) - 1)).toBeLessThan(1e-4);
    // Preconditions of the formula: the station is never starved for long nor blocked.
    expect(station.blocked).toBeLessThan(1e-3);
    expect(station.starved).toBeLessThan(1e-3);
    // Down a share 1 − A of the time, and one failure per MTBF of processing.
    expect(Math.abs(station.down - (1 - availability))).toBeLessThan(0.01);
    expect(Math.abs(station.failuresPerHour / ((station.processing * 3600) / k.mtbf) - 1)).toBeLessThan(0.08);
  }, 120_000);

  it('slow carriers (exchange 2.01 s): failures count operating time only, TH = 1 / (c / A + e)', async () => {
    const k: Case = {
      cycle: 4,
      mtbf: 120,
      mttr: 12,
      pitch: 200,
      carriers: { count: 20, lengthMm: 160, minGapMm: 40, vMaxMmPerS: 100, aMaxMmPerS2: 10_000 },
    };
    const { expected, ci, station, availability, exchange } = await check(k);
    expect(exchange).toBeCloseTo(2.01, 10);
    expect(ci.halfWidth / ci.mean).toBeLessThan(0.01);
    expect(expected).toBeGreaterThanOrEqual(ci.low);
    expect(expected).toBeLessThanOrEqual(ci.high);
    const elapsedTimeFailures = (3600 * availability) / (k.cycle + exchange);
    expect(elapsedTimeFailures).toBeLessThan(ci.low);
    expect(station.blocked).toBeLessThan(1e-3);
  }, 120_000);
});
