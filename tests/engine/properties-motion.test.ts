// The inverse of the motion profile (fast-check, fixed seed): the time a move needs to cover a given
// distance, used to wake a lane start the moment the carrier ahead has cleared it, must land on the
// profile's own position function and grow with the distance.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { moveTime, positionAt, timeToReach, type MotionProfile } from '../../workers/engine/motion/profile';

const PROPERTY_SEED = 5_530_117;

const profile: fc.Arbitrary<MotionProfile> = fc
  .record({
    vMax: fc.double({ min: 50, max: 20_000, noNaN: true }),
    aMax: fc.double({ min: 100, max: 1e6, noNaN: true }),
    jMax: fc.option(fc.double({ min: 1_000, max: 1e8, noNaN: true }), { nil: undefined }),
  })
  .map((p) => (p.jMax === undefined ? { vMax: p.vMax, aMax: p.aMax } : { vMax: p.vMax, aMax: p.aMax, jMax: p.jMax }));

const move = fc.tuple(
  profile,
  fc.double({ min: 1, max: 50_000, noNaN: true }),
  fc.double({ min: 0, max: 1, noNaN: true }),
  fc.double({ min: 0, max: 1, noNaN: true }),
);

describe('timeToReach inverts positionAt', () => {
  it('the carrier is at the asked distance at the returned time, within 1e-6 mm per metre moved', () => {
    fc.assert(
      fc.property(move, ([p, distance, share]) => {
        const x = share * distance;
        const t = timeToReach(distance, p, x);
        expect(t).toBeGreaterThanOrEqual(0);
        expect(t).toBeLessThanOrEqual(moveTime(distance, p) + 1e-12);
        expect(Math.abs(positionAt(distance, p, t) - x)).toBeLessThanOrEqual(1e-6 * Math.max(1, distance / 1000));
      }),
      { seed: PROPERTY_SEED, numRuns: 2_000 },
    );
  });

  it('a farther point is reached no earlier, the start at once and the end at the move time', () => {
    fc.assert(
      fc.property(move, ([p, distance, a, b]) => {
        const [near, far] = a <= b ? [a, b] : [b, a];
        expect(timeToReach(distance, p, near * distance)).toBeLessThanOrEqual(
          timeToReach(distance, p, far * distance) + 1e-12,
        );
        expect(timeToReach(distance, p, 0)).toBe(0);
        expect(timeToReach(distance, p, distance)).toBe(moveTime(distance, p));
      }),
      { seed: PROPERTY_SEED, numRuns: 2_000 },
    );
  });
});
