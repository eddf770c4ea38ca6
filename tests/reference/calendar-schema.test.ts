// The calendar schema refuses impossible calendars with a message at the offending field.
import { describe, expect, it } from 'vitest';
import { calendarSchema } from '../../shared/scenario/calendar';

const base = { shiftsPerDay: 2, hoursPerShift: 8, breaks: [], daysPerWeek: 5, weeksPerYear: 48 };

function problems(input: unknown): string[] {
  const result = calendarSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('calendar schema', () => {
  it('accepts a plain two-shift calendar and defaults breaks to none, stopping manual stations only', () => {
    const { breaks: _breaks, ...withoutBreaks } = base;
    expect(calendarSchema.parse(withoutBreaks)).toEqual({ ...base, breakMode: 'manualStations' });
  });

  it('accepts breaks that stop the whole line, and refuses any other break mode at its field', () => {
    expect(calendarSchema.parse({ ...base, breakMode: 'wholeLine' }).breakMode).toBe('wholeLine');
    expect(problems({ ...base, breakMode: 'sometimes' })).toEqual([
      'breakMode: breakMode must be "manualStations" (only manual stations pause) or "wholeLine" (the whole line stops)',
    ]);
  });

  it.each([
    [{ shiftsPerDay: 4, hoursPerShift: 5 }, 'shiftsPerDay: shiftsPerDay must be from 1 to 3'],
    [{ shiftsPerDay: 1.5 }, 'shiftsPerDay: shiftsPerDay must be a whole number'],
    [{ hoursPerShift: 0 }, 'hoursPerShift: hoursPerShift must be above zero'],
    [
      { shiftsPerDay: 3, hoursPerShift: 9 },
      'hoursPerShift: shiftsPerDay × hoursPerShift is 27 h; it must be at most 24 h: shorten the shifts or use fewer',
    ],
    [{ daysPerWeek: 8 }, 'daysPerWeek: daysPerWeek must be from 1 to 7'],
    [{ weeksPerYear: 0 }, 'weeksPerYear: weeksPerYear must be from 1 to 53'],
    [{ weeksPerYear: '52' }, 'weeksPerYear: weeksPerYear must be a number'],
    [
      { breaks: [{ startMinute: 470, minutes: 20 }] },
      'breaks.0.minutes: break ends at minute 490, after the 480-minute shift; move it earlier or shorten it',
    ],
    [{ breaks: [{ startMinute: -5, minutes: 20 }] }, 'breaks.0.startMinute: startMinute must be zero or more'],
    [{ breaks: [{ startMinute: 60, minutes: 0 }] }, 'breaks.0.minutes: minutes must be above zero'],
    [
      {
        breaks: [
          { startMinute: 240, minutes: 30 },
          { startMinute: 120, minutes: 130 },
        ],
      },
      'breaks.0.startMinute: break at minute 240 overlaps the break starting at minute 120; merge them or move one',
    ],
    [
      { breaks: [{ startMinute: 0, minutes: 480 }] },
      'breaks: breaks add up to 480 minutes, the whole 480-minute shift; leave some working time',
    ],
    [{ breaks: [3] }, 'breaks.0: each break must be an object with startMinute and minutes'],
  ])('%j is refused with a message at the field', (change, message) => {
    expect(problems({ ...base, ...change })).toEqual([message]);
  });
});
