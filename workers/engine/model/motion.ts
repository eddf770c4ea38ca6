// How long a move along a lane takes and where the carrier is during it. Independent carriers move
// rest to rest with their motion profile (loaded or empty); a carrier that follows a moving carrier
// uses the slower of the two profiles in every parameter, so it can never catch up with the one ahead
// (both start from rest, the follower no earlier, and its target is behind the leader's). Belt
// pallets move at the constant belt speed.
import type { Scenario } from '../../../shared/scenario/scenario';
import { moveTime, positionAt, timeToReach, type MotionProfile } from '../motion/profile';

export const PROFILE_LOADED = 0;
export const PROFILE_EMPTY = 1;
/** Component-wise minimum of loaded and empty, for a follower whose leader has the other profile. */
export const PROFILE_SLOWER = 2;

export type Motion = {
  moveSeconds(distanceMm: number, profile: number): number;
  travelledMm(distanceMm: number, profile: number, elapsedSeconds: number): number;
  /** Seconds into a move of distanceMm until the carrier has covered xMm (the inverse of travelledMm). */
  secondsToCover(distanceMm: number, profile: number, xMm: number): number;
  /** Top speed of a loaded carrier, for route estimates. */
  cruiseMmPerS: number;
};

function toProfile(p: { vMaxMmPerS: number; aMaxMmPerS2: number; jMaxMmPerS3?: number }): MotionProfile {
  return p.jMaxMmPerS3 === undefined
    ? { vMax: p.vMaxMmPerS, aMax: p.aMaxMmPerS2 }
    : { vMax: p.vMaxMmPerS, aMax: p.aMaxMmPerS2, jMax: p.jMaxMmPerS3 };
}

function slower(a: MotionProfile, b: MotionProfile): MotionProfile {
  const out: MotionProfile = { vMax: Math.min(a.vMax, b.vMax), aMax: Math.min(a.aMax, b.aMax) };
  // A profile without jerk limit changes acceleration instantly: the finite jerk is the slower one.
  if (a.jMax !== undefined || b.jMax !== undefined) out.jMax = Math.min(a.jMax ?? Infinity, b.jMax ?? Infinity);
  return out;
}

const CACHE_BITS = 9;

/**
 * Remembers recent move times by exact distance, per profile: a line repeats the same few distances
 * (station to station, one pitch) thousands of times, and an S-curve move time costs square and cube
 * roots. A direct-mapped table: a hit returns the very number the formula gave, so results do not change.
 */
function cachedMoveTime(profiles: MotionProfile[]): (d: number, p: number) => number {
  const size = 1 << CACHE_BITS;
  const keys = new Float64Array(size * profiles.length).fill(-1);
  const values = new Float64Array(size * profiles.length);
  return (d, p) => {
    const at = p * size + (Math.imul((d * 64) | 0, 0x9e3779b1) >>> (32 - CACHE_BITS));
    if (keys[at] === d) return values[at];
    const t = moveTime(d, profiles[p]);
    keys[at] = d;
    values[at] = t;
    return t;
  };
}

/**
 * The same for the time a move takes to cover a point (timeToReach): asked whenever a lane's rear
 * carrier moves off the lane start, with the few distances and points of a queue moving up, and its
 * S-curve branch bisects a cubic. Keyed by the exact distance and point; a hit returns the formula's number.
 */
function cachedTimeToReach(profiles: MotionProfile[]): (d: number, p: number, x: number) => number {
  const size = 1 << CACHE_BITS;
  const keyD = new Float64Array(size * profiles.length).fill(-1);
  const keyX = new Float64Array(size * profiles.length);
  const values = new Float64Array(size * profiles.length);
  return (d, p, x) => {
    const at =
      p * size + (Math.imul(((d * 64) | 0) ^ Math.imul((x * 64) | 0, 0x85ebca6b), 0x9e3779b1) >>> (32 - CACHE_BITS));
    if (keyD[at] === d && keyX[at] === x) return values[at];
    const t = timeToReach(d, profiles[p], x);
    keyD[at] = d;
    keyX[at] = x;
    values[at] = t;
    return t;
  };
}

export function createMotion(s: Scenario): Motion {
  if (s.conveyor.kind === 'belt') {
    const speed = s.conveyor.speedMmPerS;
    return {
      moveSeconds: (d) => (d > 0 ? d / speed : 0),
      travelledMm: (d, _p, t) => (t <= 0 ? 0 : Math.min(d, t * speed)),
      secondsToCover: (d, _p, x) => (x <= 0 ? 0 : Math.min(d, x) / speed),
      cruiseMmPerS: speed,
    };
  }
  const loaded = toProfile(s.carriers.loaded);
  const empty = s.carriers.empty ? toProfile(s.carriers.empty) : loaded;
  const profiles = [loaded, empty, slower(loaded, empty)];
  const moveSeconds = cachedMoveTime(profiles);
  return {
    moveSeconds,
    travelledMm: (d, p, t) => positionAt(d, profiles[p], t, moveSeconds(d, p)),
    secondsToCover: cachedTimeToReach(profiles),
    cruiseMmPerS: loaded.vMax,
  };
}

/** The profile a carrier may use when it starts moving behind a carrier that is itself moving. */
export function followerProfile(own: number, leader: number): number {
  return own === leader ? own : PROFILE_SLOWER;
}
