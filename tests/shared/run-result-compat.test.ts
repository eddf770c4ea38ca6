// Results stored by earlier engines still parse, and the transfer shares derive what they can.
import { describe, expect, it } from 'vitest';
import { runResultSchema, transferResultSchema, transferShares } from '../../shared/results/run-result';
import { makeRunResult } from '../api/fixtures/run-result';

describe('stored results from before engine 1.2.0', () => {
  it('parse without the transfer shares, the transfer bottleneck and the break mode', () => {
    const { bottleneckTransferId: _t, breakMode: _b, ...old } = makeRunResult();
    const parsed = runResultSchema.parse(old);
    expect(parsed.bottleneckTransferId).toBeNull();
    expect(parsed.breakMode).toBe('manualStations');
  });

  it('give idle and busy from utilisation and blocked, and leave carrying and returning unknown', () => {
    const old = transferResultSchema.parse({
      id: 't',
      name: 'T',
      kind: 'elevator',
      utilisation: 0.9,
      blocked: 0.3,
      meanQueue: 1,
      movesPerHour: 100,
    });
    const shares = transferShares(old);
    expect(shares.idle).toBeCloseTo(0.1, 12);
    expect(shares.busy).toBeCloseTo(0.6, 12);
    expect(shares.carrying).toBeNull();
    expect(shares.returning).toBeNull();
  });

  it('new results carry all four shares, adding up to 1', () => {
    const t = transferResultSchema.parse({
      id: 't',
      name: 'T',
      kind: 'lateral',
      utilisation: 0.8,
      blocked: 0.1,
      carrying: 0.5,
      returning: 0.2,
      idle: 0.2,
      busy: 0.7,
      meanQueue: 1,
      movesPerHour: 100,
    });
    const s = transferShares(t);
    expect((s.carrying ?? 0) + (s.returning ?? 0) + s.blocked + s.idle).toBeCloseTo(1, 12);
  });
});
