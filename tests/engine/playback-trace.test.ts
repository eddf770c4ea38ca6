// The playback trace: a replay of one replication records where every carrier and station was, and
// agrees with the run it replays.
import { describe, expect, it } from 'vitest';
import type { PlaybackTrace } from '../../shared/results/playback';
import { recordPlayback, runExperiment, TraceLimitError } from '../../workers/engine';
import { loadExample } from './helpers';

const fast = { yieldToHost: async () => undefined };
const stacked = loadExample('stacked-loop.json');

/** Share of [from, to] each station spent in state 0 (processing), from the trace's station changes. */
function processingShares(trace: PlaybackTrace, from: number, to: number): number[] {
  const { t, station, state, count } = trace.stations;
  const shares = trace.stationIds.map(() => 0);
  const current = trace.stationIds.map(() => -1);
  const since = trace.stationIds.map(() => from);
  const close = (s: number, at: number) => {
    if (current[s] === 0) shares[s] += Math.max(0, at - since[s]);
    since[s] = Math.max(at, from);
  };
  for (let i = 0; i < count; i++) {
    close(station[i], Math.min(t[i], to));
    current[station[i]] = state[i];
  }
  trace.stationIds.forEach((_, s) => close(s, to));
  return shares.map((x) => x / (to - from));
}

describe('playback trace', () => {
  it('gives each station the same processing share as the run it replays', async () => {
    const settings = { hours: 0.5, warmupMinutes: 10, replications: 1, seed: 7 };
    const result = await runExperiment(stacked, settings, fast);
    const trace = await recordPlayback(
      stacked,
      settings,
      { replication: 0, startMinutes: 10, windowMinutes: 30 },
      fast,
    );
    const shares = processingShares(trace, 600, 600 + 1800);
    result.stations.forEach((st, i) => {
      expect(trace.stationIds[i]).toBe(st.id);
      expect(shares[i]).toBeCloseTo(st.processing, 9);
    });
  });

  it('knows where every carrier is when the window opens, and keeps changes in time order on lanes that exist', async () => {
    const trace = await recordPlayback(
      stacked,
      { hours: 1, warmupMinutes: 5, replications: 2, seed: 3 },
      { replication: 1, startMinutes: 20, windowMinutes: 5 },
      fast,
    );
    const { t, carrier, where, posMm, destMm, endT, count } = trace.carriers;
    const seenBeforeStart = new Set<number>();
    for (let i = 0; i < count; i++) {
      if (t[i] <= trace.startSeconds) seenBeforeStart.add(carrier[i]);
      if (i > 0 && t[i - 1] >= trace.startSeconds) expect(t[i]).toBeGreaterThanOrEqual(t[i - 1]);
      expect(t[i]).toBeLessThanOrEqual(trace.endSeconds);
      expect(endT[i]).toBeGreaterThanOrEqual(t[i]);
      if (where[i] >= 0) {
        expect(where[i]).toBeLessThan(trace.laneIds.length);
        expect(posMm[i]).toBeGreaterThanOrEqual(0);
        expect(destMm[i]).toBeGreaterThanOrEqual(posMm[i]);
      } else expect(-1 - where[i]).toBeLessThan(trace.connKind.length);
    }
    expect(seenBeforeStart.size).toBe(trace.carrierCount);
    expect(trace.connKind).toContain('elevator');
    // Carriers go up and down the elevators within five minutes of a running stacked loop.
    expect(Array.from(where.subarray(0, count)).some((w) => w < 0)).toBe(true);
  });

  it('repeats itself for the same replication and differs between replications', async () => {
    const settings = { hours: 1, warmupMinutes: 0, replications: 3, seed: 11 };
    const request = { startMinutes: 10, windowMinutes: 3 };
    const a = await recordPlayback(stacked, settings, { ...request, replication: 2 }, fast);
    const b = await recordPlayback(stacked, settings, { ...request, replication: 2 }, fast);
    const c = await recordPlayback(stacked, settings, { ...request, replication: 0 }, fast);
    expect(Array.from(b.carriers.posMm)).toEqual(Array.from(a.carriers.posMm));
    expect(Array.from(c.carriers.t)).not.toEqual(Array.from(a.carriers.t));
  });

  it('stops with a message naming the limit when the window holds too many changes', async () => {
    const run = recordPlayback(
      stacked,
      { hours: 1, warmupMinutes: 0, replications: 1, seed: 1 },
      { windowMinutes: 30 },
      fast,
      { carrierChangesMax: 500, stationChangesMax: 300_000 },
    );
    await expect(run).rejects.toBeInstanceOf(TraceLimitError);
    await expect(run).rejects.toThrow(/more than 500 carrier changes .* choose a shorter window/);
  });

  it('refuses a replication the run does not have and a window past its end, naming the field', async () => {
    const settings = { hours: 1, warmupMinutes: 0, replications: 2, seed: 1 };
    await expect(recordPlayback(stacked, settings, { replication: 2 }, fast)).rejects.toThrow(
      /playback\.replication: the run has 2 replications/,
    );
    await expect(recordPlayback(stacked, settings, { startMinutes: 60 }, fast)).rejects.toThrow(
      /playback\.startMinutes/,
    );
    await expect(recordPlayback(stacked, settings, { windowMinutes: 241 }, fast)).rejects.toThrow(
      /playback\.windowMinutes: windowMinutes must be from 1 to 240/,
    );
  });
});
