// Rest-to-rest move times of a carrier on straight track, and where it is during the move (for the
// space-time heatmap). Without jerk the profile is trapezoidal (triangular when the move is too short
// to reach top speed); with jerk it is the symmetric seven-segment S-curve, whose phases are derived in
// Biagiotti & Melchiorri, "Trajectory Planning for Automatic Machines and Robots", Springer 2008, §3.4
// (the double-S trajectory; section number recalled from memory).
// Units: mm, s, mm/s, mm/s², mm/s³. Distances are magnitudes; a move of zero or less takes no time.

/** jMax absent (or Infinity) means acceleration may change instantly: the trapezoidal profile. */
export type MotionProfile = { vMax: number; aMax: number; jMax?: number };

/** The jerk limit, or undefined when there is none; an infinite jerk would otherwise give 0 × ∞. */
function jerkLimit(p: MotionProfile): number | undefined {
  return p.jMax !== undefined && p.jMax < Infinity ? p.jMax : undefined;
}

/**
 * The speed the move peaks at. A move either reaches vMax or is all acceleration and deceleration,
 * and for the S-curve the latter has two forms: aMax reached (constant-acceleration middle) or not.
 */
function peakSpeed(distance: number, p: MotionProfile): number {
  const { vMax, aMax } = p;
  const jMax = jerkLimit(p);
  if (jMax === undefined) {
    return distance >= (vMax * vMax) / aMax ? vMax : Math.sqrt(aMax * distance);
  }
  if (distance >= vMax * accelerationTime(vMax, p)) return vMax;
  const speedAtFullAcceleration = (aMax * aMax) / jMax;
  if (distance >= (2 * aMax * speedAtFullAcceleration) / jMax) {
    // distance = v (v/aMax + aMax/jMax), solved for v.
    return (-speedAtFullAcceleration + Math.sqrt(speedAtFullAcceleration ** 2 + 4 * aMax * distance)) / 2;
  }
  // distance = 2 v sqrt(v / jMax), solved for v.
  return Math.cbrt((distance * distance * jMax) / 4);
}

/** Time to accelerate from rest to `speed` (equal to the time to brake from it). */
function accelerationTime(speed: number, p: MotionProfile): number {
  const { aMax } = p;
  const jMax = jerkLimit(p);
  if (jMax === undefined) return speed / aMax;
  return speed >= (aMax * aMax) / jMax ? speed / aMax + aMax / jMax : 2 * Math.sqrt(speed / jMax);
}

export function moveTime(distanceMm: number, p: MotionProfile): number {
  if (!(distanceMm > 0)) return 0;
  const peak = peakSpeed(distanceMm, p);
  const ramp = accelerationTime(peak, p);
  // Both ramps cover peak * ramp together (each averages half the peak speed); the rest is cruise.
  return 2 * ramp + Math.max(0, distanceMm - peak * ramp) / peak;
}

/** Distance covered `elapsed` seconds after leaving rest with the given peak speed. */
function rampDistance(elapsed: number, peak: number, ramp: number, p: MotionProfile): number {
  const { aMax } = p;
  const jMax = jerkLimit(p);
  if (jMax === undefined) return (aMax * elapsed * elapsed) / 2;
  const peakAcceleration = Math.min(aMax, Math.sqrt(peak * jMax));
  const jerkTime = peakAcceleration / jMax;
  if (elapsed <= jerkTime) return (jMax * elapsed ** 3) / 6;
  const remaining = ramp - elapsed;
  if (remaining >= jerkTime) {
    const t = elapsed - jerkTime;
    return (jMax * jerkTime ** 3) / 6 + ((jMax * jerkTime * jerkTime) / 2) * t + (peakAcceleration * t * t) / 2;
  }
  // The last jerk phase mirrors the first: measured back from the end of the ramp.
  return (peak * ramp) / 2 - peak * remaining + (jMax * remaining ** 3) / 6;
}

/** total: the move's time when the caller already has it (remembered, as model/motion.ts does). */
export function positionAt(distanceMm: number, p: MotionProfile, t: number, total = moveTime(distanceMm, p)): number {
  if (!(distanceMm > 0) || t <= 0) return 0;
  if (t >= total) return distanceMm;
  const peak = peakSpeed(distanceMm, p);
  const ramp = accelerationTime(peak, p);
  if (t <= ramp) return rampDistance(t, peak, ramp, p);
  if (t < total - ramp) return (peak * ramp) / 2 + peak * (t - ramp);
  return distanceMm - rampDistance(total - t, peak, ramp, p);
}

/** The time into the ramp at which it has covered y (0 ≤ y ≤ peak · ramp / 2): the inverse of rampDistance. */
function rampTime(y: number, peak: number, ramp: number, p: MotionProfile): number {
  const jMax = jerkLimit(p);
  if (jMax === undefined) return Math.sqrt((2 * y) / p.aMax);
  const peakAcceleration = Math.min(p.aMax, Math.sqrt(peak * jMax));
  const jerkTime = peakAcceleration / jMax;
  // First jerk phase: y = j t³ / 6.
  if (y <= (jMax * jerkTime ** 3) / 6) return Math.cbrt((6 * y) / jMax);
  // Constant acceleration: y = A Tj²/6 + (A Tj/2) u + (A/2) u², u = t − Tj.
  if (y <= rampDistance(ramp - jerkTime, peak, ramp, p)) {
    const b = jerkTime / 2;
    const c = (jerkTime * jerkTime) / 6 - y / peakAcceleration;
    return jerkTime - b + Math.sqrt(b * b - 2 * c);
  }
  // Last jerk phase (a cubic): bisect the closed-form ramp distance there, which is monotone.
  let lo = ramp - jerkTime;
  let hi = ramp;
  for (let i = 0; i < 60 && hi - lo > 1e-10; i++) {
    const mid = (lo + hi) / 2;
    if (rampDistance(mid, peak, ramp, p) >= y) hi = mid;
    else lo = mid;
  }
  return hi;
}

/**
 * The earliest time into a move of distanceMm at which the carrier has covered xMm: the inverse of
 * positionAt, for waking whoever waits until a moving carrier has cleared a point.
 */
export function timeToReach(distanceMm: number, p: MotionProfile, xMm: number): number {
  if (!(distanceMm > 0) || !(xMm > 0)) return 0;
  const total = moveTime(distanceMm, p);
  if (xMm >= distanceMm) return total;
  const peak = peakSpeed(distanceMm, p);
  const ramp = accelerationTime(peak, p);
  const rampMm = (peak * ramp) / 2;
  if (xMm <= rampMm) return rampTime(xMm, peak, ramp, p);
  if (xMm <= distanceMm - rampMm) return ramp + (xMm - rampMm) / peak;
  return total - rampTime(distanceMm - xMm, peak, ramp, p);
}
