// Simulated time is a double; late in a long run a time difference carries rounding of the clock's
// magnitude (about 1.2e-7 s at 10^9 s). These properties drive moves, lane entries, transfers and
// station work at absolute times from 0 up to 10^9 s and check that nothing depends on where the
// clock stands: no stall, no overlap (checked after every event), and the same output as at t = 0.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { scenarioSchema, type ScenarioInput } from '../../shared/scenario/scenario';
import { compileLine } from '../../workers/engine/model/compile';
import { stallMessage, zeroTimes } from '../../workers/engine/model/gridlock';
import { Replication } from '../../workers/engine/replication';
import { createStreamFactory } from '../../workers/engine/random/streams';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { randomScenario } from '../reference/support/random-scenario';
import { loadExample } from './helpers';

const LATEST = 1e9;

/** One replication started at `origin`, run for `hours` after a 2-minute warm-up; returns its output count. */
function outputFrom(doc: ScenarioInput | Record<string, unknown>, origin: number, hours: number, seed: number): number {
  const line = compileLine(scenarioSchema.parse(doc));
  const warmupSeconds = origin + 120;
  const replication = new Replication(line, createStreamFactory(seed, 0), {
    originSeconds: origin,
    warmupSeconds,
    endSeconds: warmupSeconds + hours * 3600,
    timeBins: 8,
    positionBins: 8,
    eventBudget: 50_000_000,
    checkInvariants: true,
  });
  while (!replication.run(() => false));
  return replication.recorder.outputCount;
}

/** Origins from 0 to 10^9 s, always a whole number of shifts so the break pattern lines up with t = 0. */
function origins(shiftSeconds: number): fc.Arbitrary<number> {
  const last = Math.floor(LATEST / shiftSeconds);
  return fc
    .oneof(
      fc.constantFrom(0, 1, Math.ceil(2 ** 22 / shiftSeconds), Math.ceil(2 ** 29 / shiftSeconds), last),
      fc.integer({ min: 0, max: last }),
    )
    .map((k) => k * shiftSeconds);
}

describe('the clock at any magnitude', () => {
  it('random lines started anywhere up to 10^9 s make what they make at t = 0, without overlap or stall', () => {
    fc.assert(
      fc.property(
        randomScenario,
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 0, max: 1000 }),
        (doc, at, seed) => {
          const shift = doc.calendar.hoursPerShift * 3600;
          const origin = Math.floor((at * LATEST) / shift) * shift;
          const early = outputFrom(doc, 0, 0.25, seed);
          const late = outputFrom(doc, origin, 0.25, seed);
          // Rounding may reorder two events that fall together at one clock and not at the other, after
          // which the runs part ways; the counts stay close.
          expect(Math.abs(late - early)).toBeLessThanOrEqual(2 + 0.05 * early);
        },
      ),
      { numRuns: 30 },
    );
  }, 300_000);

  it.each(['stacked-loop.json', 'triple-deck.json', 'belt-baseline.json'])(
    '%s runs at chosen origins up to 10^9 s with the output of t = 0',
    (file) => {
      const doc = loadExample(file);
      const shift = (doc.calendar as { hoursPerShift: number }).hoursPerShift * 3600;
      const early = outputFrom(doc, 0, 0.5, 7);
      fc.assert(
        fc.property(origins(shift), (origin) => {
          expect(Math.abs(outputFrom(doc, origin, 0.5, 7) - early)).toBeLessThanOrEqual(2 + 0.05 * early);
        }),
        { numRuns: 6 },
      );
    },
    300_000,
  );
});

describe('the stall message', () => {
  it('names the zero times when the scenario has some', () => {
    const doc = serialLine({
      stations: [
        { cycle: { kind: 'fixed', value: 0 } },
        { cycle: { kind: 'empirical', samples: [0, 2] } },
        { cycle: { kind: 'fixed', value: 3 } },
      ],
      carriers: 2,
    });
    const line = compileLine(scenarioSchema.parse(doc));
    expect(zeroTimes(line)).toEqual(['station "S1" (cycle time)', 'station "S2" (cycle time)']);
    expect(stallMessage(line, 10, 5)).toMatch(/give these a time above zero: station "S1"/);
  });

  it('does not blame the scenario when every time is above zero', () => {
    const line = compileLine(scenarioSchema.parse(loadExample('stacked-loop.json')));
    expect(zeroTimes(line)).toEqual([]);
    expect(stallMessage(line, 10, 5)).toMatch(/every cycle and transfer time of this scenario is above zero/);
    expect(stallMessage(line, 10, 5)).not.toMatch(/give these/);
  });
});
