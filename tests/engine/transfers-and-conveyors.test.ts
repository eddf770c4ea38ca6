import { describe, expect, it } from 'vitest';
import { serialLine } from '../../workers/engine/testing/line-builder';
import { checkedRun, loadExample } from './helpers';

const fixed = (value: number) => ({ kind: 'fixed' as const, value });

describe('transfers and conveyors', () => {
  it('an elevator that cannot hand over is blocked until the lane start clears', async () => {
    // The stacked loop queues carriers from loading back into the up elevator.
    const r = await checkedRun(loadExample('stacked-loop.json'), {
      hours: 1,
      warmupMinutes: 10,
      replications: 1,
      seed: 2,
    });
    const up = r.transfers.find((t) => t.id === 'lift-up');
    const down = r.transfers.find((t) => t.id === 'lift-down');
    expect(up?.blocked).toBeGreaterThan(0.2);
    expect(down?.blocked).toBeLessThan(0.05);
    // Every carrier that goes down comes up again: the moves per hour agree within one loop.
    expect(Math.abs((up?.movesPerHour ?? 0) - (down?.movesPerHour ?? 0))).toBeLessThanOrEqual(r.carriers.count);
  });

  it('an elevator cycle limits throughput when it is the slowest resource', async () => {
    const doc = loadExample('stacked-loop.json') as { transfers: { handlingSeconds: number }[] };
    // 30 s handling plus 0.6 s lift plus 0.6 s return: at most 3600 / 31.2 carriers an hour.
    for (const t of doc.transfers) t.handlingSeconds = 30;
    const r = await checkedRun(doc, { hours: 2, warmupMinutes: 20, replications: 1, seed: 2 });
    expect(r.throughputPerHour.mean).toBeLessThanOrEqual(3600 / 31.2 + 1);
    expect(r.throughputPerHour.mean).toBeGreaterThan(0.85 * (3600 / 31.2));
  });

  it('the belt baseline of the same process is slower than independent carriers', async () => {
    const settings = { hours: 1, warmupMinutes: 10, replications: 2, seed: 4 };
    const carriers = await checkedRun(loadExample('stacked-loop.json'), settings);
    const belt = await checkedRun(loadExample('belt-baseline.json'), settings);
    expect(belt.conveyor).toBe('belt');
    expect(belt.throughputPerHour.mean).toBeLessThan(carriers.throughputPerHour.mean);
    // Stop and locate is part of every station visit on the belt.
    const press = belt.stations.find((s) => s.id === 'PR');
    expect(press?.meanCycleSeconds).toBeCloseTo(9 + 1.5, 9);
  });

  it('a belt moves pallets at belt speed: a deterministic line is paced by station plus locate time', async () => {
    const doc = serialLine({
      stations: [{ cycle: fixed(3) }, { cycle: fixed(6), bufferBefore: 2 }, { cycle: fixed(2), bufferBefore: 2 }],
      carriers: 6,
      belt: { speedMmPerS: 200, stopAndLocateSeconds: 1 },
    });
    const r = await checkedRun(doc, { hours: 1, warmupMinutes: 10, replications: 1 });
    // The 6 s station plus 1 s locate, plus the 0.5 s a 100 mm pallet needs to move in at 200 mm/s.
    expect(r.parts.output).toBeGreaterThan(3600 / 7.5 - 2);
    expect(r.parts.output).toBeLessThanOrEqual(3600 / 7.5 + 1);
  });

  it('a failing station spends time down and fails about once per mean operating time between failures', async () => {
    const doc = serialLine({
      stations: [
        { cycle: fixed(2) },
        { cycle: fixed(10), failures: { timeBetweenFailuresSeconds: fixed(600), timeToRepairSeconds: fixed(60) } },
        { cycle: fixed(2), bufferBefore: 2 },
      ],
      carriers: 6,
    });
    const r = await checkedRun(doc, { hours: 4, warmupMinutes: 0, replications: 1 });
    const s = r.stations[1];
    // Fixed 600 s of processing between failures, 60 s repairs: down/(processing) = 60/600.
    expect(s.down / s.processing).toBeCloseTo(0.1, 2);
    expect(s.failuresPerHour).toBeCloseTo((3600 * s.processing) / 600, 0);
  });
});
