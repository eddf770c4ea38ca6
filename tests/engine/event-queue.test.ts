import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { EventQueue } from '../../workers/engine/kernel/event-queue';
import { PRIORITY } from '../../workers/engine/kernel/priorities';

describe('event queue', () => {
  it('pops events by time, then priority, then the order they were scheduled', () => {
    fc.assert(
      fc.property(
        fc.array(fc.tuple(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: 3 })), { maxLength: 600 }),
        (items) => {
          const q = new EventQueue();
          items.forEach(([t, p], i) => q.push(t / 4, p, 1, i, 0));
          const expected = items
            .map(([t, p], i) => ({ t: t / 4, p, i }))
            .sort((a, b) => a.t - b.t || a.p - b.p || a.i - b.i);
          const got: number[] = [];
          while (q.pop()) got.push(q.popA);
          expect(got).toEqual(expected.map((e) => e.i));
        },
      ),
    );
  });

  it('reuses slots when events interleave with pops', () => {
    const q = new EventQueue();
    let t = 0;
    for (let i = 0; i < 10_000; i++) {
      q.push(t + (i % 7), 0, 2, i, i * 2);
      if (i % 2 === 1) {
        q.pop();
        expect(q.popTime).toBeGreaterThanOrEqual(t);
        t = q.popTime;
      }
    }
    expect(q.length).toBe(5_000);
  });

  it('postpones events of the chosen kinds and keeps the order of everything else', () => {
    fc.assert(
      fc.property(
        fc.array(
          fc.tuple(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 9 })),
          {
            maxLength: 300,
          },
        ),
        fc.integer({ min: 0, max: 30 }),
        (items, delay) => {
          const q = new EventQueue();
          items.forEach(([t, p, kind], i) => q.push(t, p, kind, i, 0));
          q.postpone(delay, 6);
          const expected = items
            .map(([t, p, kind], i) => ({ t: kind <= 6 ? t + delay : t, p, i }))
            .sort((a, b) => a.t - b.t || a.p - b.p || a.i - b.i);
          const got: number[] = [];
          while (q.pop()) got.push(q.popA);
          expect(got).toEqual(expected.map((e) => e.i));
        },
      ),
    );
  });

  it('orders ties by the named priorities: calendar, line, sample, end', () => {
    const q = new EventQueue();
    q.push(5, PRIORITY.end, 9, 3, 0);
    q.push(5, PRIORITY.sample, 8, 2, 0);
    q.push(5, PRIORITY.line, 1, 1, 0);
    q.push(5, PRIORITY.calendar, 7, 0, 0);
    const got: number[] = [];
    while (q.pop()) got.push(q.popA);
    expect(got).toEqual([0, 1, 2, 3]);
  });
});
