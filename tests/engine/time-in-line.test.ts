// Time in line and departure rate: every part that leaves (unloaded or scrapped) counts, while lead
// time and throughput stay with output parts only.
import { describe, expect, it } from 'vitest';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { checkedRun } from './helpers';

const fixed = (value: number) => ({ kind: 'fixed' as const, value });
const HOURS = 1;
const line = () =>
  serialLine({ stations: [{ cycle: fixed(2) }, { cycle: fixed(5) }, { cycle: fixed(1) }], carriers: 3 });

/** The same line with its middle station turned into an inspection that rejects the given share. */
function inspected(rejectShare: number) {
  const doc = line();
  const [load, middle, unload] = doc.steps;
  return { ...doc, steps: [load, { ...middle, kind: 'inspect' as const, rejectShare }, unload] };
}

describe('time in line over all departures', () => {
  it('equals lead time, and departures equal throughput, when nothing is scrapped', async () => {
    const r = await checkedRun(line(), { hours: HOURS, warmupMinutes: 5, replications: 2, seed: 4 });
    expect(r.parts.scrapped).toBe(0);
    expect(r.timeInLineSeconds).toEqual({
      mean: r.leadTimeSeconds.mean,
      p50: r.leadTimeSeconds.p50,
      p95: r.leadTimeSeconds.p95,
    });
    expect(r.departuresPerHour).toEqual(r.throughputPerHour);
    for (const x of r.replications) expect(x.timeInLineMeanSeconds).toBe(x.leadTimeMeanSeconds);
  });

  it('counts scrapped parts, which lead time and throughput leave out', async () => {
    const r = await checkedRun(inspected(1), { hours: HOURS, warmupMinutes: 5, replications: 2, seed: 4 });
    expect(r.parts.output).toBe(0);
    expect(r.throughputPerHour.mean).toBe(0);
    expect(r.leadTimeSeconds.mean).toBe(0);
    // The 5 s inspection paces the line: about 720 parts an hour leave, each after at least its 5 s there.
    expect(r.departuresPerHour.mean).toBeGreaterThan(700);
    expect(r.timeInLineSeconds.mean).toBeGreaterThanOrEqual(5);
    for (const x of r.replications) {
      expect(x.departuresPerHour * HOURS).toBeCloseTo(x.scrapped, 9);
      expect(x.timeInLineMeanSeconds).toBeGreaterThanOrEqual(5);
    }
  });

  it('mixes output and scrapped parts by their counts', async () => {
    const r = await checkedRun(inspected(0.3), { hours: HOURS, warmupMinutes: 5, replications: 1, seed: 4 });
    const [x] = r.replications;
    expect(x.scrapped).toBeGreaterThan(0);
    expect(x.output).toBeGreaterThan(0);
    expect(x.departuresPerHour * HOURS).toBeCloseTo(x.output + x.scrapped, 9);
    expect(x.departuresPerHour).toBeGreaterThan(x.throughputPerHour);
    // Scrapped parts leave at the inspection, before the unload step, so the mean over all parts is shorter.
    expect(x.timeInLineMeanSeconds).toBeLessThan(x.leadTimeMeanSeconds);
  });
});
