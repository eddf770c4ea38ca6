import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { checkedRun } from './helpers';

const station = fc.record({
  mean: fc.double({ min: 0.5, max: 20, noNaN: true }),
  cv: fc.double({ min: 0.05, max: 1, noNaN: true }),
  bufferBefore: fc.integer({ min: 0, max: 3 }),
});

describe('random serial lines', () => {
  it('never let carriers overlap, lose a carrier or a part, whatever the stations and motion', async () => {
    await fc.assert(
      fc.asyncProperty(
        fc.array(station, { minLength: 2, maxLength: 5 }),
        fc.integer({ min: 1, max: 10 }),
        fc.record({
          vMax: fc.integer({ min: 200, max: 3000 }),
          aMax: fc.integer({ min: 500, max: 30_000 }),
          emptyFaster: fc.boolean(),
          gap: fc.integer({ min: 0, max: 60 }),
        }),
        fc.integer({ min: 0, max: 1000 }),
        async (stations, carriers, motion, seed) => {
          const doc = serialLine({
            stations: stations.map((s) => ({
              cycle: { kind: 'gamma', mean: s.mean, cv: s.cv },
              bufferBefore: s.bufferBefore,
            })),
            carriers,
            gapMm: motion.gap,
            vMaxMmPerS: motion.vMax,
            aMaxMmPerS2: motion.aMax,
            returnPlaces: carriers + 2,
          });
          if (motion.emptyFaster) doc.carriers.empty = { vMaxMmPerS: motion.vMax * 2, aMaxMmPerS2: motion.aMax * 3 };
          // checkedRun throws on any overlap or conservation error after any event.
          const r = await checkedRun(doc, { hours: 0.2, warmupMinutes: 1, replications: 1, seed });
          expect(r.parts.output).toBeGreaterThan(0);
          for (const s of r.stations)
            expect(s.processing + s.starved + s.blocked + s.down + s.onBreak).toBeCloseTo(1, 9);
        },
      ),
      { numRuns: 25 },
    );
  }, 120_000);
});
