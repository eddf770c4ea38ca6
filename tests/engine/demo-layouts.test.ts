// The demo's two layouts differ in a way a carrier-sizing study shows: the stacked line's elevators
// (900 mm at 300 mm/s, 2 s handling at each end: an 8 s round trip) cap it below the side-by-side
// line, which runs at its 7 s press's pace; both reach the 10 s target takt with a modest fleet.
import { describe, expect, it } from 'vitest';
import { scenarioSchema } from '../../shared/scenario/scenario';
import { pairedDifference } from '../../workers/analysis/compare-means';
import { runExperiment } from '../../workers/engine';
import { DEMO_LAYOUTS } from '../../server/db/seed/demo-layouts';

// One whole 8 h shift, so the breaks weigh as they do in a working day.
const SETTINGS = { hours: 8, warmupMinutes: 30, replications: 5, seed: 3 };
const [stacked, sideBySide] = DEMO_LAYOUTS.map((l) => l.example);
const at = (doc: unknown, count: number) => {
  const d = structuredClone(doc) as { carriers: { count: number } };
  d.carriers.count = count;
  return runExperiment(d, SETTINGS, { yieldToHost: async () => undefined });
};
const perReplication = (r: Awaited<ReturnType<typeof at>>) => r.replications.map((x) => x.throughputPerHour);

describe('the demo layouts', () => {
  it('are valid scenarios with the demo names and invented descriptions', () => {
    for (const layout of DEMO_LAYOUTS) {
      const s = scenarioSchema.parse(layout.example);
      expect(s.description).toMatch(/^Invented demo/);
    }
  });

  it('side by side makes significantly more at a full fleet; the stacked line is held by its elevators', async () => {
    const [a, b] = await Promise.all([at(stacked, 20), at(sideBySide, 20)]);
    const d = pairedDifference(perReplication(a), perReplication(b));
    expect(d.significant).toBe(true);
    expect(d.difference).toBeGreaterThan(20);
    // An 8 s elevator round trip passes at most 450 carriers an hour (hand calculation: 3600 / (2 + 2 × 900 / 300)).
    expect(a.throughputPerHour.mean).toBeLessThan(3600 / 8);
    // Both reach the target takt of 10 s (360 parts/h).
    expect(a.throughputPerHour.mean).toBeGreaterThan(360);
    expect(b.throughputPerHour.mean).toBeGreaterThan(360);
  }, 60_000);

  it('more carriers do not lift the stacked line past its elevators', async () => {
    const [twenty, forty] = await Promise.all([at(stacked, 20), at(stacked, 40)]);
    const d = pairedDifference(perReplication(twenty), perReplication(forty));
    expect(Math.abs(d.difference)).toBeLessThan(0.01 * twenty.throughputPerHour.mean);
  }, 60_000);
});
