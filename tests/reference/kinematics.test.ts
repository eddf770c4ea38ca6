// Carrier move times against the textbook rest-to-rest profiles, and positions along the move checked
// by integrating the motion numerically.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { moveTime, positionAt, type MotionProfile } from '../../workers/engine/motion/profile';

// 2500 mm/s top speed and a 210 mm station pitch: common trade practice for independent-carrier track.
// 20 000 mm/s² acceleration and 400 000 mm/s³ jerk: our assumption for a loaded carrier.
const V = 2500;
const A = 20_000;
const J = 400_000;
/** Property checks draw from a fixed seed so every run tests the same cases. */
const PROPERTY_SEED = 20_261_202;
const trapezoid: MotionProfile = { vMax: V, aMax: A };
const sCurve = { vMax: V, aMax: A, jMax: J };

describe('trapezoidal and triangular profiles (Biagiotti & Melchiorri, "Trajectory Planning for Automatic Machines and Robots", Springer 2008, §3.2; section recalled from memory)', () => {
  it('a 1000 mm move reaches top speed: T = D/v + v/a = 0.525 s', () => {
    expect(Math.abs(moveTime(1000, trapezoid) - (1000 / V + V / A))).toBeLessThan(1e-9);
    expect(Math.abs(moveTime(1000, trapezoid) - 0.525)).toBeLessThan(1e-9);
  });

  it('a 210 mm move is too short for top speed (v²/a = 312.5 mm): T = 2√(D/a) ≈ 0.204939 s', () => {
    expect(Math.abs(moveTime(210, trapezoid) - 2 * Math.sqrt(210 / A))).toBeLessThan(1e-9);
    expect(Math.abs(moveTime(210, trapezoid) - 0.204_939_015_319)).toBeLessThan(1e-9);
  });

  it('both formulas meet at D = v²/a, where the cruise shrinks to nothing', () => {
    const d = (V * V) / A;
    expect(Math.abs(moveTime(d, trapezoid) - 2 * Math.sqrt(d / A))).toBeLessThan(1e-9);
    expect(Math.abs(moveTime(d * (1 + 1e-12), trapezoid) - moveTime(d * (1 - 1e-12), trapezoid))).toBeLessThan(1e-9);
  });

  it('a zero move takes no time', () => {
    expect(moveTime(0, trapezoid)).toBe(0);
    expect(positionAt(0, sCurve, 1)).toBe(0);
  });
});

/**
 * Phase durations of the rest-to-rest double-S profile as Biagiotti & Melchiorri 2008, §3.4 (section recalled from memory) write them
 * (Tj: each jerk phase, Ta: acceleration period, Tv: cruise), with their cases for a limit not reached.
 */
function doubleSPhases(d: number, v: number, a: number, j: number): { tj: number; ta: number; tv: number } {
  let tj = v * j >= a * a ? a / j : Math.sqrt(v / j);
  let ta = v * j >= a * a ? tj + v / a : 2 * tj;
  const tv = d / v - ta;
  if (tv >= 0) return { tj, ta, tv };
  tj = a / j;
  ta = (tj + Math.sqrt(tj * tj + (4 * d) / a)) / 2;
  if (ta < 2 * tj) {
    tj = Math.cbrt(d / (2 * j));
    ta = 2 * tj;
  }
  return { tj, ta, tv: 0 };
}

/** Integrates the bang-bang jerk signal of the given phases with fixed steps (trapezoid rule on
 * acceleration and speed), independently of the engine's closed forms. Steps are fitted to each
 * phase so no step straddles a jump in jerk. */
function integrate(phases: { tj: number; ta: number; tv: number }, j: number, dt: number) {
  const { tj, ta, tv } = phases;
  const ramp = (sign: number): [number, number][] => [
    [tj, sign * j],
    [ta - 2 * tj, 0],
    [tj, -sign * j],
  ];
  const segments = [...ramp(1), [tv, 0] as [number, number], ...ramp(-1)];
  let a = 0;
  let v = 0;
  let s = 0;
  let peakV = 0;
  let peakA = 0;
  let total = 0;
  for (const [duration, jerk] of segments) {
    total += duration;
    const steps = Math.ceil(duration / dt);
    const h = duration / steps;
    for (let i = 0; i < steps; i++) {
      const aNext = a + jerk * h;
      const vNext = v + ((a + aNext) / 2) * h;
      s += ((v + vNext) / 2) * h;
      a = aNext;
      v = vNext;
      peakV = Math.max(peakV, v);
      peakA = Math.max(peakA, Math.abs(a));
    }
  }
  return { s, v, a, peakV, peakA, total };
}

describe('jerk-limited (seven-segment) profile', () => {
  it('a 1000 mm move reaches aMax and vMax: T = 2(v/a + a/j) + (D − v(v/a + a/j))/v = 0.575 s (worked by hand)', () => {
    // v/a = 0.125 s, a/j = 0.05 s: each ramp lasts 0.175 s and covers 218.75 mm; 562.5 mm cruise at 2500 mm/s.
    expect(Math.abs(moveTime(1000, sCurve) - 0.575)).toBeLessThan(1e-9);
  });

  it('a 210 mm move reaches aMax but not vMax (worked by hand: peak ≈ 1609.50 mm/s, T ≈ 0.260950 s)', () => {
    // Peak v solves v² + (a²/j)v − aD = 0; each ramp lasts v/a + a/j.
    const peak = (-(A * A) / J + Math.sqrt(((A * A) / J) ** 2 + 4 * A * 210)) / 2;
    expect(Math.abs(moveTime(210, sCurve) - 2 * (peak / A + A / J))).toBeLessThan(1e-9);
    expect(Math.abs(moveTime(210, sCurve) - 0.260_950_231_097)).toBeLessThan(1e-9);
  });

  it('a 50 mm move reaches neither limit: T = 4·∛(D/2j) ≈ 0.158740 s (worked by hand)', () => {
    expect(Math.abs(moveTime(50, sCurve) - 4 * Math.cbrt(50 / (2 * J)))).toBeLessThan(1e-9);
  });

  it('a slow profile reaches vMax without reaching aMax: T = 2√(v/j) + D/v ≈ 2.070711 s (worked by hand)', () => {
    // vMax = 500 mm/s < a²/j = 1000 mm/s: each ramp is two jerk phases of √(v/j) = 0.035355 s.
    const slow = { vMax: 500, aMax: A, jMax: J };
    expect(Math.abs(moveTime(1000, slow) - (2 * Math.sqrt(500 / J) + 1000 / 500))).toBeLessThan(1e-9);
  });

  it.each([
    [1000, sCurve],
    [210, sCurve],
    [50, sCurve],
    [1000, { vMax: 500, aMax: A, jMax: J }],
    [4000, { vMax: 1800, aMax: 8000, jMax: 100_000 }],
  ] as const)(
    '%d mm: the textbook phases give the same time, and integrating them ends at rest at the target',
    (d, p) => {
      const phases = doubleSPhases(d, p.vMax, p.aMax, p.jMax);
      const run = integrate(phases, p.jMax, 1e-6);
      expect(Math.abs(moveTime(d, p) - run.total)).toBeLessThan(1e-9);
      expect(Math.abs(run.s - d)).toBeLessThan(1e-3);
      expect(Math.abs(run.v)).toBeLessThan(1e-3);
      expect(run.peakV).toBeLessThanOrEqual(p.vMax * (1 + 1e-6));
      expect(run.peakA).toBeLessThanOrEqual(p.aMax * (1 + 1e-6));
    },
  );

  it('an infinite jerk limit is the trapezoid', () => {
    const unlimited = { ...trapezoid, jMax: Infinity };
    for (const d of [50, 210, 1000]) {
      expect(moveTime(d, unlimited)).toBe(moveTime(d, trapezoid));
      expect(positionAt(d, unlimited, moveTime(d, trapezoid) / 3)).toBe(
        positionAt(d, trapezoid, moveTime(d, trapezoid) / 3),
      );
    }
  });

  it('with a very large jerk the S-curve approaches the trapezoid', () => {
    const nearlyTrapezoid = { ...trapezoid, jMax: 1e12 };
    expect(Math.abs(moveTime(1000, nearlyTrapezoid) - moveTime(1000, trapezoid))).toBeLessThan(1e-6);
    expect(Math.abs(moveTime(210, nearlyTrapezoid) - moveTime(210, trapezoid))).toBeLessThan(1e-6);
  });
});

describe('position along a move', () => {
  const profiles = [trapezoid, sCurve, { vMax: 500, aMax: A, jMax: J }];

  it.each([50, 210, 1000, 5000])('%d mm: ends exactly at the target, is monotonic and symmetric', (d) => {
    for (const p of profiles) {
      const total = moveTime(d, p);
      expect(positionAt(d, p, total)).toBe(d);
      expect(positionAt(d, p, total + 1)).toBe(d);
      expect(positionAt(d, p, 0)).toBe(0);
      expect(Math.abs(positionAt(d, p, total / 2) - d / 2)).toBeLessThan(1e-9 * d);
      let previous = 0;
      for (let i = 1; i <= 2000; i++) {
        const s = positionAt(d, p, (total * i) / 2000);
        expect(s).toBeGreaterThanOrEqual(previous - 1e-12 * d);
        previous = s;
      }
    }
  });

  it('numerical differentiation of positions stays within vMax and aMax and is continuous', () => {
    for (const [d, p] of [
      [1000, sCurve],
      [210, sCurve],
      [1000, trapezoid],
      [210, trapezoid],
    ] as const) {
      const total = moveTime(d, p);
      const h = total / 20_000;
      let previousV = 0;
      let fastest = 0;
      let hardest = 0;
      let largestSpeedStep = 0;
      for (let t = h; t < total - h; t += h) {
        const v = (positionAt(d, p, t + h) - positionAt(d, p, t - h)) / (2 * h);
        const a = (positionAt(d, p, t + h) - 2 * positionAt(d, p, t) + positionAt(d, p, t - h)) / (h * h);
        fastest = Math.max(fastest, v);
        hardest = Math.max(hardest, Math.abs(a));
        largestSpeedStep = Math.max(largestSpeedStep, Math.abs(v - previousV));
        previousV = v;
      }
      expect(fastest).toBeLessThanOrEqual(p.vMax * (1 + 1e-6));
      expect(hardest).toBeLessThanOrEqual(p.aMax * (1 + 1e-3));
      // Speed changes by at most aMax·h per step: no jumps in position or speed.
      expect(largestSpeedStep).toBeLessThanOrEqual(p.aMax * h * 1.01 + 1e-9);
    }
  });

  it('moves take longer with jerk limits, and longer moves take longer (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 20_000, noNaN: true }),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 100, max: 5000, noNaN: true }),
        fc.double({ min: 1000, max: 50_000, noNaN: true }),
        fc.double({ min: 10_000, max: 5_000_000, noNaN: true }),
        (d, extra, vMax, aMax, jMax) => {
          const withJerk = { vMax, aMax, jMax };
          const plain = { vMax, aMax };
          expect(moveTime(d, withJerk)).toBeGreaterThanOrEqual(moveTime(d, plain) * (1 - 1e-12));
          expect(moveTime(d + extra, withJerk)).toBeGreaterThanOrEqual(moveTime(d, withJerk) * (1 - 1e-12));
          expect(Math.abs(positionAt(d, withJerk, moveTime(d, withJerk) * (1 - 1e-12)) - d)).toBeLessThan(1e-6 * d);
        },
      ),
      { numRuns: 1000, seed: PROPERTY_SEED },
    );
  });
});

describe('ordering of moves started together (what keeps a follower behind its leader)', () => {
  const profile = fc.record({
    vMax: fc.double({ min: 100, max: 5000, noNaN: true }),
    aMax: fc.double({ min: 1000, max: 50_000, noNaN: true }),
    jMax: fc.option(fc.double({ min: 10_000, max: 5_000_000, noNaN: true }), { nil: undefined }),
  });
  const distance = fc.double({ min: 1, max: 5000, noNaN: true });
  const share = fc.double({ min: 0, max: 1, noNaN: true });

  it('a shorter move is never ahead of a longer one with the same profile', () => {
    fc.assert(
      fc.property(profile, distance, share, share, (p, long, shortShare, when) => {
        const short = long * shortShare;
        const t = when * moveTime(long, p);
        expect(positionAt(short, p, t)).toBeLessThanOrEqual(positionAt(long, p, t) * (1 + 1e-12) + 1e-9);
      }),
      { numRuns: 2000, seed: PROPERTY_SEED },
    );
  });

  it('a profile slower in every limit is never ahead over the same distance', () => {
    const factor = fc.double({ min: 0.05, max: 1, noNaN: true });
    const jerkOfSlow = fc.option(fc.double({ min: 10_000, max: 5_000_000, noNaN: true }), { nil: undefined });
    // t runs to the end of the fast move, where the slow one may still be under way.
    fc.assert(
      fc.property(profile, factor, factor, factor, jerkOfSlow, distance, share, (p, kv, ka, kj, j, d, when) => {
        // A finite jerk is slower than none, so a slow profile may gain a limit but never lose one.
        const slow = { vMax: p.vMax * kv, aMax: p.aMax * ka, jMax: p.jMax === undefined ? j : p.jMax * kj };
        const t = when * moveTime(d, p);
        expect(positionAt(d, slow, t)).toBeLessThanOrEqual(positionAt(d, p, t) * (1 + 1e-12) + 1e-9);
      }),
      { numRuns: 2000, seed: PROPERTY_SEED },
    );
  });
});
