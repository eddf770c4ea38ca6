// Annual output from the shift calendar, and when manual stations' operators are at work.
import { describe, expect, it } from 'vitest';
import { calendarSchema, type Calendar } from '../../shared/scenario/calendar';
import {
  SECONDS_PER_DAY,
  SECONDS_PER_WEEK,
  annualOutput,
  isOnShift,
  nextShiftChange,
  productiveHoursPerYear,
} from '../../workers/engine/calendar/annual';

// Three 8-hour shifts, five days, 52 weeks: common trade practice. 40 minutes of breaks per shift (two of
// 20 minutes, at 2 h and 5 h into the shift): our assumption.
const threeShifts: Calendar = calendarSchema.parse({
  shiftsPerDay: 3,
  hoursPerShift: 8,
  breaks: [
    { startMinute: 300, minutes: 20 },
    { startMinute: 120, minutes: 20 },
  ],
  daysPerWeek: 5,
  weeksPerYear: 52,
});

describe('annual output', () => {
  it('a 2.0 s takt over 3 × 8 h less 40 min, 5 days, 52 weeks gives 10,296,000 parts (≈ 10.3 million, common trade practice)', () => {
    // 3 × (8 − 40/60) h × 5 × 52 = 5720 h; 3600 / 2.0 = 1800 parts/h; 1800 × 5720 = 10,296,000 (worked by hand).
    expect(productiveHoursPerYear(threeShifts)).toBeCloseTo(5720, 9);
    expect(annualOutput(3600 / 2.0, threeShifts)).toBeCloseTo(10_296_000, 4);
  });

  it('a calendar without breaks counts every shift hour', () => {
    const c = calendarSchema.parse({ shiftsPerDay: 2, hoursPerShift: 7.5, daysPerWeek: 6, weeksPerYear: 46 });
    expect(productiveHoursPerYear(c)).toBe(2 * 7.5 * 6 * 46);
  });
});

describe('operators on shift', () => {
  const hour = 3600;
  const minute = 60;

  it('works from the week start, stops for each break and resumes after it', () => {
    expect(isOnShift(threeShifts, 0)).toBe(true);
    expect(isOnShift(threeShifts, 120 * minute - 1)).toBe(true);
    expect(isOnShift(threeShifts, 120 * minute)).toBe(false);
    expect(isOnShift(threeShifts, 139 * minute)).toBe(false);
    expect(isOnShift(threeShifts, 140 * minute)).toBe(true);
    // Second shift of the day starts at 8 h; its first break at 10 h.
    expect(isOnShift(threeShifts, 10 * hour + 10 * minute)).toBe(false);
    expect(isOnShift(threeShifts, 23 * hour + 59 * minute)).toBe(true);
  });

  it('has no shift at the weekend and repeats week after week', () => {
    expect(isOnShift(threeShifts, 5 * SECONDS_PER_DAY + hour)).toBe(false);
    expect(isOnShift(threeShifts, 6 * SECONDS_PER_DAY + 23 * hour)).toBe(false);
    expect(isOnShift(threeShifts, 3 * SECONDS_PER_WEEK + 140 * minute)).toBe(true);
    expect(isOnShift(threeShifts, 3 * SECONDS_PER_WEEK + 130 * minute)).toBe(false);
  });

  it('leaves the unscheduled part of a day off shift', () => {
    const twoShifts = calendarSchema.parse({ shiftsPerDay: 2, hoursPerShift: 8, daysPerWeek: 5, weeksPerYear: 48 });
    expect(isOnShift(twoShifts, 15 * hour)).toBe(true);
    expect(isOnShift(twoShifts, 16 * hour)).toBe(false);
    expect(nextShiftChange(twoShifts, 0)).toBe(16 * hour);
    expect(nextShiftChange(twoShifts, 16 * hour)).toBe(SECONDS_PER_DAY);
    expect(nextShiftChange(twoShifts, 4 * SECONDS_PER_DAY + 17 * hour)).toBe(SECONDS_PER_WEEK);
  });

  it('names the next change: break start, break end, weekend, Monday', () => {
    expect(nextShiftChange(threeShifts, 0)).toBe(120 * minute);
    expect(nextShiftChange(threeShifts, 120 * minute)).toBe(140 * minute);
    // Midnight between shifts is no change: the next one is the third shift's first break.
    expect(nextShiftChange(threeShifts, 23 * hour)).toBe(SECONDS_PER_DAY + 120 * minute);
    expect(nextShiftChange(threeShifts, 4 * SECONDS_PER_DAY + 23 * hour)).toBe(5 * SECONDS_PER_DAY);
    expect(nextShiftChange(threeShifts, 5 * SECONDS_PER_DAY)).toBe(SECONDS_PER_WEEK);
  });

  it('agrees with isOnShift: the state holds until the named change and flips there', () => {
    for (let t = 0; t < 2 * SECONDS_PER_WEEK; t = nextShiftChange(threeShifts, t)) {
      const change = nextShiftChange(threeShifts, t);
      expect(isOnShift(threeShifts, (t + change) / 2)).toBe(isOnShift(threeShifts, t));
      expect(isOnShift(threeShifts, change)).not.toBe(isOnShift(threeShifts, t));
    }
  });

  it('a line staffed around the clock every day never changes', () => {
    const always = calendarSchema.parse({ shiftsPerDay: 3, hoursPerShift: 8, daysPerWeek: 7, weeksPerYear: 52 });
    expect(isOnShift(always, 6 * SECONDS_PER_DAY + 23.9 * hour)).toBe(true);
    expect(nextShiftChange(always, 1234)).toBe(Infinity);
  });

  it('around the clock with breaks, the week boundary is not a change', () => {
    const always = calendarSchema.parse({ ...threeShifts, daysPerWeek: 7 });
    expect(nextShiftChange(always, 6 * SECONDS_PER_DAY + 23 * hour)).toBe(SECONDS_PER_WEEK + 120 * minute);
  });
});
