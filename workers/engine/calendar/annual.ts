// The shift calendar seen by the engine: productive hours per year for annual output, and whether
// operators are at work at a given moment, for manual stations that stop during breaks.
//
// Time convention: simulation time 0 is the start of the first shift of the first working day of a
// week. Each working day's shifts follow one another from that daily start with no gap; the day's
// remaining hours and the non-working days of the week are off shift. The pattern repeats weekly.
import type { Calendar } from '../../../shared/scenario/calendar';

export const SECONDS_PER_DAY = 86_400;
export const SECONDS_PER_WEEK = 7 * SECONDS_PER_DAY;

function breakMinutesPerShift(c: Calendar): number {
  let minutes = 0;
  for (const b of c.breaks) minutes += b.minutes;
  return minutes;
}

export function productiveHoursPerYear(c: Calendar): number {
  const hoursPerShift = c.hoursPerShift - breakMinutesPerShift(c) / 60;
  return c.shiftsPerDay * hoursPerShift * c.daysPerWeek * c.weeksPerYear;
}

/** Parts per year when the line makes `throughputPerHour` during every productive hour. */
export function annualOutput(throughputPerHour: number, c: Calendar): number {
  return throughputPerHour * productiveHoursPerYear(c);
}

/**
 * The on-shift windows of one week as flat [start, end) pairs in seconds since week start, sorted.
 * Cached per calendar object, since manual stations ask on every start of work.
 */
const windowCache = new WeakMap<Calendar, Float64Array>();

export function onShiftWindows(c: Calendar): Float64Array {
  const cached = windowCache.get(c);
  if (cached) return cached;
  const breaks = [...c.breaks].sort((a, b) => a.startMinute - b.startMinute);
  const shiftSeconds = c.hoursPerShift * 3600;
  const edges: number[] = [];
  for (let day = 0; day < c.daysPerWeek; day++) {
    for (let shift = 0; shift < c.shiftsPerDay; shift++) {
      const shiftStart = day * SECONDS_PER_DAY + shift * shiftSeconds;
      let from = shiftStart;
      for (const b of breaks) {
        const breakStart = shiftStart + b.startMinute * 60;
        if (breakStart > from) edges.push(from, breakStart);
        from = breakStart + b.minutes * 60;
      }
      if (shiftStart + shiftSeconds > from) edges.push(from, shiftStart + shiftSeconds);
    }
  }
  // Back-to-back shifts (and a break ending a shift) leave touching windows; join them.
  const merged: number[] = [];
  for (let i = 0; i < edges.length; i += 2) {
    if (merged.length > 0 && merged[merged.length - 1] === edges[i]) merged[merged.length - 1] = edges[i + 1];
    else merged.push(edges[i], edges[i + 1]);
  }
  const windows = Float64Array.from(merged);
  windowCache.set(c, windows);
  return windows;
}

/** Whether operators are at work at simulation time t (seconds; any t >= 0, the week repeats). */
export function isOnShift(c: Calendar, t: number): boolean {
  const w = onShiftWindows(c);
  const inWeek = t - Math.floor(t / SECONDS_PER_WEEK) * SECONDS_PER_WEEK;
  for (let i = 0; i < w.length; i += 2) {
    if (inWeek < w[i]) return false;
    if (inWeek < w[i + 1]) return true;
  }
  return false;
}

/**
 * The first time after t at which isOnShift changes value, so the engine can schedule that event;
 * Infinity when it never changes (operators always present).
 */
export function nextShiftChange(c: Calendar, t: number): number {
  const w = onShiftWindows(c);
  if (w.length === 0) return Infinity;
  // A window ending at the week's end continues into one starting at the next week's start.
  const wrapsAround = w[0] === 0 && w[w.length - 1] === SECONDS_PER_WEEK;
  if (wrapsAround && w.length === 2) return Infinity;
  const weekStart = Math.floor(t / SECONDS_PER_WEEK) * SECONDS_PER_WEEK;
  const inWeek = t - weekStart;
  for (let i = 0; i < w.length; i++) {
    if (w[i] <= inWeek) continue;
    return wrapsAround && i === w.length - 1 ? weekStart + SECONDS_PER_WEEK + w[1] : weekStart + w[i];
  }
  return weekStart + SECONDS_PER_WEEK + w[0];
}
