// Two exponential stations with a finite buffer between them against the exact throughput of the
// two-machine line with blocking after service (Buzacott & Shanthikumar, "Stochastic Models of
// Manufacturing Systems", 1993, ch. 3; Gershwin, "Manufacturing Systems Engineering", 1994, ch. 3;
// chapters recalled from memory). The chain is derived in support/queueing.ts: state n = parts the
// first station has finished and the second has not, n = 0 .. b + 2 for b places between them.
//
// On the track: the load station is the first machine and the unload station the second, on one
// lane, (b + 1) pitches apart, so exactly b carriers fit between them; a carrier the load station
// finished with no place ahead stays in the station (blocking after service). The first machine is
// never starved: the loop holds b + 8 carriers and the trip back from unloading takes about 0.2 s,
// so spare empty carriers always wait at loading. The second is never blocked: the track after it is
// empty. 4 mm carriers with a 1 mm gap at 20 m/s and 10^8 mm/s² move up one place in 0.45 ms,
// negligible against cycle times of about a second.
import { describe, expect, it } from 'vitest';
import { loopScenario, type LoopLine } from './support/loop-line';
import { twoMachineLine } from './support/queueing';
import { interval, replicationThroughputs, simulate } from './support/run';

const PITCH = 5;
const LOAD_AT = 1_000;

function line(mean1: number, mean2: number, placesBetween: number): LoopLine {
  return {
    laneLengthsMm: [2_000, 2_000],
    stations: [
      { id: 'M1', lane: 0, positionMm: LOAD_AT, cycle: { kind: 'exponential', mean: mean1 } },
      {
        id: 'M2',
        lane: 0,
        positionMm: LOAD_AT + (placesBetween + 1) * PITCH,
        cycle: { kind: 'exponential', mean: mean2 },
      },
    ],
    carriers: { count: placesBetween + 8, lengthMm: 4, minGapMm: 1, vMaxMmPerS: 20_000, aMaxMmPerS2: 100_000_000 },
  };
}

const CASES: [number, number, number][] = [
  [1.0, 1.2, 0],
  [1.2, 1.0, 1],
  [1.0, 1.0, 3],
];

describe('two stations with a finite buffer, blocking after service (Buzacott & Shanthikumar 1993; Gershwin 1994)', () => {
  // Three comparisons in one family: Bonferroni level 1 − 0.05/3 each.
  it.each(CASES)(
    'means %d s and %d s with %i places between: throughput, blocking and starving as the birth–death chain',
    async (mean1, mean2, b) => {
      const exact = twoMachineLine(1 / mean1, 1 / mean2, b);
      const result = await simulate(loopScenario(line(mean1, mean2, b)), {
        hours: 8,
        warmupMinutes: 30,
        replications: 10,
        seed: 'two-machine',
      });
      const ci = interval(replicationThroughputs(result), 1 - 0.05 / CASES.length);
      expect(ci.halfWidth / ci.mean).toBeLessThan(0.015);
      expect(exact.throughput * 3600).toBeGreaterThanOrEqual(ci.low);
      expect(exact.throughput * 3600).toBeLessThanOrEqual(ci.high);
      const [m1, m2] = result.stations;
      // Time shares, averaged over replications: within 0.01 of the chain's probabilities.
      expect(Math.abs(m1.blocked - exact.blocked)).toBeLessThan(0.01);
      expect(Math.abs(m2.starved - exact.starved)).toBeLessThan(0.01);
      expect(m1.starved).toBeLessThan(0.005);
      expect(m2.blocked).toBeLessThan(0.005);
    },
    120_000,
  );

  it('the check can tell the buffer size: one place more or less changes throughput beyond the interval', () => {
    const [mean1, mean2, b] = CASES[1];
    const at = (places: number) => twoMachineLine(1 / mean1, 1 / mean2, places).throughput;
    expect(at(b + 1) / at(b) - 1).toBeGreaterThan(0.03);
    expect(1 - at(b - 1) / at(b)).toBeGreaterThan(0.03);
  });
});
