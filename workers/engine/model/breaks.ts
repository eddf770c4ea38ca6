// Break times of manual stations. Simulated time is working time: shifts follow one another
// without the off-shift hours between them (the line stands still then and resumes as it was), so
// the calendar's breaks recur every hoursPerShift, at the same minutes of each shift.
import type { Calendar } from '../../../shared/scenario/calendar';

export type BreakEdge = { time: number; starting: boolean };

/** The first break start or end strictly after t, or null when the calendar has no breaks. */
export function nextBreakEdge(c: Calendar, t: number): BreakEdge | null {
  if (c.breaks.length === 0) return null;
  const shift = c.hoursPerShift * 3600;
  const first = Math.max(0, Math.floor(t / shift));
  let best: BreakEdge | null = null;
  for (let k = first; k <= first + 1 && best === null; k++) {
    for (const b of c.breaks) {
      const start = k * shift + b.startMinute * 60;
      const end = start + b.minutes * 60;
      if (start > t && (best === null || start < best.time)) best = { time: start, starting: true };
      if (end > t && start <= t && (best === null || end < best.time)) best = { time: end, starting: false };
    }
  }
  return best;
}

/** Whether t lies inside a break (at its start included, at its end excluded). */
export function inBreak(c: Calendar, t: number): boolean {
  const shift = c.hoursPerShift * 3600;
  const within = t - Math.floor(t / shift) * shift;
  return c.breaks.some((b) => within >= b.startMinute * 60 && within < (b.startMinute + b.minutes) * 60);
}
