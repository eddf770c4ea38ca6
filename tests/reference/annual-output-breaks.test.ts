// Annual output of an all-automatic line whose breaks stop the whole line. The check is the trade's
// rule of thumb: a 2 s takt on three 8-h shifts, 5 days a week, with 40 minutes of breaks per shift,
// gives about 10.3 M parts a year (3 × (8 h − 40 min) × 5 × 52 weeks × 1,800 parts/h = 10.296 M).
// That figure is common trade practice with no published source. Here it is reproduced by a simulated
// line whose carriers halt and stations stop during breaks, not by the arithmetic alone.
import { describe, expect, it } from 'vitest';
import { runExperiment } from '../../workers/engine';
import { serialLine } from '../../workers/engine/testing/line-builder';

/** Five automatic stations, the slowest at 2 s; the carriers' in-feed adds about 6 ms to its cycle. */
function line(breakMode: 'manualStations' | 'wholeLine') {
  const doc = serialLine({
    name: `Two-second line, breaks: ${breakMode}`,
    stations: [1.5, 1.8, 2, 1.7, 1.5].map((value) => ({ cycle: { kind: 'fixed' as const, value }, bufferBefore: 2 })),
    carriers: 16,
  });
  // Breaks at 2 h (10 min), 4 h (20 min) and 6 h (10 min) into each shift: 40 minutes in all.
  doc.calendar = {
    shiftsPerDay: 3,
    hoursPerShift: 8,
    daysPerWeek: 5,
    weeksPerYear: 52,
    breaks: [
      { startMinute: 120, minutes: 10 },
      { startMinute: 240, minutes: 20 },
      { startMinute: 360, minutes: 10 },
    ],
    breakMode,
  };
  return doc;
}

// A whole day of three shifts after the warm-up, so every break of the day falls in the window.
const settings = { hours: 24, warmupMinutes: 30, replications: 1, seed: 1 };
const hooks = { yieldToHost: async () => undefined, checkInvariants: true };

describe('annual output with whole-line breaks', () => {
  it('a 2 s takt on 3 × 8 h, 5 days, 40 min of breaks per shift makes about 10.3 M parts a year', async () => {
    const r = await runExperiment(line('wholeLine'), settings, hooks);
    expect(r.breakMode).toBe('wholeLine');
    expect(r.annualOutput.mean / 10.3e6).toBeGreaterThan(0.99);
    expect(r.annualOutput.mean / 10.3e6).toBeLessThan(1.01);
    // Every station spends the breaks on break: 2 h of 24.
    for (const s of r.stations) expect(s.onBreak).toBeCloseTo(2 / 24, 3);
    // Carriers stand still during breaks: no moving time is recorded then.
    expect(r.carriers.moving).toBeLessThan(0.1);
  }, 120_000);

  it("today's mode leaves an all-automatic line running through the breaks", async () => {
    const r = await runExperiment(line('manualStations'), settings, { yieldToHost: hooks.yieldToHost });
    expect(r.breakMode).toBe('manualStations');
    // 3 × 8 h × 5 × 52 × 1,800 parts/h = 11.23 M, less the in-feed time.
    expect(r.annualOutput.mean / 11.232e6).toBeGreaterThan(0.99);
    for (const s of r.stations) expect(s.onBreak).toBe(0);
  }, 120_000);
});
