// An inspection that paces the line sends each part on by its shares: every inspection passes the
// part with probability 1 − reject − rework, scraps it with the reject share and sends it back for
// rework with the rework share, independently (Bernoulli routing; the expected number of
// inspections per part is then 1/(1 − rework), a geometric count: common trade practice in
// yield calculations). Counted over about 3 300 inspections, the three shares of the engine's counts
// must lie within four binomial standard deviations of the configured shares, and the inspection
// itself must run at the deterministic bottleneck rate 1/(c + e).
import { describe, expect, it } from 'vitest';
import { loopScenario, type LoopLine } from './support/loop-line';
import { trapezoidMoveSeconds } from './support/queueing';
import { simulate } from './support/run';

const REJECT = 0.05;
const REWORK = 0.1;

const line: LoopLine = {
  laneLengthsMm: [6_000, 6_000],
  stations: [
    { id: 'LD', lane: 0, positionMm: 1_000, cycle: { kind: 'fixed', value: 2 } },
    { id: 'P1', lane: 0, positionMm: 2_000, cycle: { kind: 'fixed', value: 3 } },
    {
      id: 'IN',
      lane: 0,
      positionMm: 3_000,
      cycle: { kind: 'fixed', value: 8 },
      inspect: { rejectShare: REJECT, reworkShare: REWORK, reworkTo: 'P1' },
    },
    { id: 'UL', lane: 0, positionMm: 5_000, cycle: { kind: 'fixed', value: 2 } },
  ],
  carriers: { count: 10, lengthMm: 160, minGapMm: 40, vMaxMmPerS: 2_000, aMaxMmPerS2: 10_000 },
};

describe('an inspection routes parts by its reject and rework shares (Bernoulli routing)', () => {
  it('pass, scrap and rework counts match the shares; the inspection runs at 1/(c + e)', async () => {
    const result = await simulate(loopScenario(line), {
      hours: 8,
      warmupMinutes: 30,
      replications: 1,
      seed: 'inspect',
    });
    const inspect = result.stations.find((s) => s.id === 'IN');
    if (!inspect) throw new Error('no station IN in the result');
    const inspections = inspect.operationsPerHour * 8;
    const exchange = trapezoidMoveSeconds(200, 2_000, 10_000);
    expect(Math.abs(inspections / ((8 * 3600) / (8 + exchange)) - 1)).toBeLessThan(0.005);
    const within = (count: number, share: number) => {
      const sd = Math.sqrt(inspections * share * (1 - share));
      expect(Math.abs(count - inspections * share)).toBeLessThan(4 * sd + 1);
    };
    within(result.parts.output, 1 - REJECT - REWORK);
    within(result.parts.scrapped, REJECT);
    within(result.parts.reworked, REWORK);
    // Every inspection ends in exactly one of the three, give or take the parts at the window edges.
    expect(
      Math.abs(result.parts.output + result.parts.scrapped + result.parts.reworked - inspections),
    ).toBeLessThanOrEqual(line.carriers.count);
  }, 60_000);
});
