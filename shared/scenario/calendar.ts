// The working calendar of a line: turns hourly throughput into annual output and tells manual
// stations when their operators are on break. Every shift of a day has the same length and breaks.
import { z } from 'zod';
import { finiteNumber } from './distribution';

export const CALENDAR_LIMITS = {
  shiftsPerDayMax: 3,
  hoursPerDay: 24,
  daysPerWeekMax: 7,
  weeksPerYearMax: 53,
  breaksPerShiftMax: 20,
} as const;

const wholeBetween = (name: string, min: number, max: number) =>
  finiteNumber(name)
    .refine(Number.isInteger, `${name} must be a whole number`)
    .refine((v) => v >= min && v <= max, `${name} must be from ${min} to ${max}`);

/**
 * What the calendar's breaks stop. manualStations: only manual stations that pause for breaks stop;
 * automatic stations and carriers run on (and fill or drain around them). wholeLine: a planned stop of
 * the whole line: carriers halt where they are, no station works, transfers finish nothing new; the
 * line resumes as it stood when the break ends.
 */
export const BREAK_MODES = ['manualStations', 'wholeLine'] as const;
export type BreakMode = (typeof BREAK_MODES)[number];

export const breakSchema = z.object(
  {
    /** Minutes after the start of the shift. */
    startMinute: finiteNumber('startMinute').refine((v) => v >= 0, 'startMinute must be zero or more'),
    minutes: finiteNumber('minutes').refine((v) => v > 0, 'minutes must be above zero'),
  },
  { error: 'each break must be an object with startMinute and minutes' },
);

export const calendarSchema = z
  .object(
    {
      shiftsPerDay: wholeBetween('shiftsPerDay', 1, CALENDAR_LIMITS.shiftsPerDayMax),
      hoursPerShift: finiteNumber('hoursPerShift').refine((v) => v > 0, 'hoursPerShift must be above zero'),
      /** The same breaks apply to every shift. */
      breaks: z
        .array(breakSchema, { error: 'breaks must be a list' })
        .max(CALENDAR_LIMITS.breaksPerShiftMax, `at most ${CALENDAR_LIMITS.breaksPerShiftMax} breaks per shift`)
        .default([]),
      breakMode: z
        .enum(BREAK_MODES, {
          error:
            'breakMode must be "manualStations" (only manual stations pause) or "wholeLine" (the whole line stops)',
        })
        .default('manualStations'),
      daysPerWeek: wholeBetween('daysPerWeek', 1, CALENDAR_LIMITS.daysPerWeekMax),
      weeksPerYear: wholeBetween('weeksPerYear', 1, CALENDAR_LIMITS.weeksPerYearMax),
    },
    {
      error:
        'calendar must be an object with shiftsPerDay, hoursPerShift, breaks, breakMode, daysPerWeek and weeksPerYear',
    },
  )
  .superRefine((c, ctx) => {
    if (c.shiftsPerDay * c.hoursPerShift > CALENDAR_LIMITS.hoursPerDay) {
      ctx.addIssue({
        code: 'custom',
        path: ['hoursPerShift'],
        message: `shiftsPerDay × hoursPerShift is ${c.shiftsPerDay * c.hoursPerShift} h; it must be at most 24 h: shorten the shifts or use fewer`,
      });
    }
    const shiftMinutes = c.hoursPerShift * 60;
    const breakMinutes = c.breaks.reduce((sum, b) => sum + b.minutes, 0);
    if (c.breaks.length > 0 && breakMinutes >= shiftMinutes) {
      ctx.addIssue({
        code: 'custom',
        path: ['breaks'],
        message: `breaks add up to ${breakMinutes} minutes, the whole ${shiftMinutes}-minute shift; leave some working time`,
      });
    }
    const order = c.breaks.map((_, i) => i).sort((a, b) => c.breaks[a].startMinute - c.breaks[b].startMinute);
    order.forEach((index, rank) => {
      const b = c.breaks[index];
      if (b.startMinute + b.minutes > shiftMinutes) {
        ctx.addIssue({
          code: 'custom',
          path: ['breaks', index, 'minutes'],
          message: `break ends at minute ${b.startMinute + b.minutes}, after the ${shiftMinutes}-minute shift; move it earlier or shorten it`,
        });
      }
      const previous = rank > 0 ? c.breaks[order[rank - 1]] : undefined;
      if (previous && previous.startMinute + previous.minutes > b.startMinute) {
        ctx.addIssue({
          code: 'custom',
          path: ['breaks', index, 'startMinute'],
          message: `break at minute ${b.startMinute} overlaps the break starting at minute ${previous.startMinute}; merge them or move one`,
        });
      }
    });
  });

export type Calendar = z.infer<typeof calendarSchema>;
export type CalendarBreak = z.infer<typeof breakSchema>;
