// A line with fixed cycle times is paced by its slowest station: one part per cycle time plus the
// exchange, the time from the finished carrier starting to leave to the next carrier standing in
// the station: with enough carriers a line reaches its bottleneck rate (Hopp & Spearman, "Factory
// Physics", 2nd ed. 2000, §7.2, best-case performance; section recalled from memory).
//
// The exchange follows the line model's documented motion rule: the waiting carrier stands one pitch
// (carrier length plus gap) behind the station and starts together with the leaving carrier, with
// the slower of the two carriers' profiles, so it needs one rest-to-rest move of one pitch. The
// move time is computed here from the trapezoidal profile (Biagiotti & Melchiorri 2008, §3.2).
import { describe, expect, it } from 'vitest';
import type { Distribution } from '../../shared/scenario/distribution';
import { LOOP_HOURS_PER_YEAR, loopScenario, type LoopLine } from './support/loop-line';
import { trapezoidMoveSeconds } from './support/queueing';
import { simulate } from './support/run';

const fixed = (value: number): Distribution => ({ kind: 'fixed', value });

const IDS = ['LD', 'P1', 'P2', 'P3', 'UL'];

function fiveStations(cycles: number[], carriers: LoopLine['carriers'], manual?: string): LoopLine {
  return {
    laneLengthsMm: [6_000, 6_000],
    stations: cycles.map((c, i) => ({
      id: IDS[i],
      lane: 0,
      positionMm: 1_000 * (i + 1),
      cycle: fixed(c),
      manual: IDS[i] === manual,
    })),
    carriers,
  };
}

async function paced(spec: LoopLine, slowest: string, hours = 4) {
  const result = await simulate(loopScenario(spec), { hours, warmupMinutes: 30, replications: 2, seed: 'paced' });
  const station = result.stations.find((s) => s.id === slowest);
  if (!station) throw new Error(`no station ${slowest} in the result`);
  return {
    throughput: result.throughputPerHour.mean,
    station,
    bottleneck: result.bottleneckStationId,
    annual: result.annualOutput.mean,
  };
}

/** Seconds of breaks inside [from, to) when every 8-hour shift has the given breaks. */
function breakSeconds(breaks: { startMinute: number; minutes: number }[], from: number, to: number): number {
  let total = 0;
  for (let shift = 0; shift * 28_800 < to; shift++) {
    for (const b of breaks) {
      const start = shift * 28_800 + b.startMinute * 60;
      total += Math.max(0, Math.min(to, start + b.minutes * 60) - Math.max(from, start));
    }
  }
  return total;
}

describe('a deterministic line runs at its slowest station (Hopp & Spearman 2000, best case)', () => {
  it('an 8 s press with 200 mm pitch below top speed: exchange 2√(200/10 000) = 0.283 s, 434.6 parts/h', async () => {
    const spec = fiveStations([2, 5, 8, 4, 3], {
      count: 8,
      lengthMm: 160,
      minGapMm: 40,
      vMaxMmPerS: 2_000,
      aMaxMmPerS2: 10_000,
    });
    const exchange = trapezoidMoveSeconds(200, 2_000, 10_000);
    const { throughput, station, bottleneck } = await paced(spec, 'P2');
    expect(Math.abs(throughput / (3600 / (8 + exchange)) - 1)).toBeLessThan(0.005);
    // The active-period method names it too: its active periods (8 s) are the longest (Roser,
    // Nakano & Tanaka, "A Practical Bottleneck Detection Method", Winter Simulation Conference 2001).
    expect(bottleneck).toBe('P2');
    // The slowest station works 8 s of every 8.283 s and waits for the next carrier the rest.
    expect(Math.abs(station.processing / (8 / (8 + exchange)) - 1)).toBeLessThan(0.005);
  }, 60_000);

  it('a 6 s pitch of 500 mm that reaches top speed: exchange 500/1000 + 1000/10 000 = 0.6 s, 545.5 parts/h', async () => {
    const spec = fiveStations([2, 3, 6, 4, 3], {
      count: 7,
      lengthMm: 400,
      minGapMm: 100,
      vMaxMmPerS: 1_000,
      aMaxMmPerS2: 10_000,
    });
    const exchange = trapezoidMoveSeconds(500, 1_000, 10_000);
    expect(exchange).toBeCloseTo(0.6, 12);
    const { throughput } = await paced(spec, 'P2');
    expect(Math.abs(throughput / (3600 / (6 + exchange)) - 1)).toBeLessThan(0.005);
  }, 60_000);

  it('a slow load station: the empty carrier moving up behind a loaded one takes the slower (loaded) profile', async () => {
    const spec = fiveStations([6, 3, 4, 2, 3], {
      count: 7,
      lengthMm: 160,
      minGapMm: 40,
      vMaxMmPerS: 2_000,
      aMaxMmPerS2: 10_000,
      empty: { vMaxMmPerS: 2_500, aMaxMmPerS2: 20_000 },
    });
    const exchange = trapezoidMoveSeconds(200, 2_000, 10_000);
    const { throughput } = await paced(spec, 'LD');
    expect(Math.abs(throughput / (3600 / (6 + exchange)) - 1)).toBeLessThan(0.005);
    // With the empty profile alone the exchange would be 0.2 s and the line 1.3 % faster.
    expect(Math.abs(throughput / (3600 / (6 + trapezoidMoveSeconds(200, 2_500, 20_000))) - 1)).toBeGreaterThan(0.005);
  }, 60_000);

  it('a manual slowest station stops for 60 min of breaks per 8-hour shift: the rate falls by the break share', async () => {
    const breaks = [
      { startMinute: 120, minutes: 15 },
      { startMinute: 240, minutes: 30 },
      { startMinute: 390, minutes: 15 },
    ];
    const spec = {
      ...fiveStations(
        [2, 5, 8, 4, 3],
        { count: 8, lengthMm: 160, minGapMm: 40, vMaxMmPerS: 2_000, aMaxMmPerS2: 10_000 },
        'P2',
      ),
      breaks,
    };
    const exchange = trapezoidMoveSeconds(200, 2_000, 10_000);
    // The observed window runs from the 30-minute warm-up to 8.5 h: it holds all three breaks.
    const breakShare = breakSeconds(breaks, 1_800, 30_600) / 28_800;
    expect(breakShare).toBeCloseTo(0.125, 12);
    const { throughput, station, annual } = await paced(spec, 'P2', 8);
    // Each break can cut off at most one part in progress, three in about 3 000: within 0.5 %.
    expect(Math.abs(throughput / ((3600 * (1 - breakShare)) / (8 + exchange)) - 1)).toBeLessThan(0.005);
    expect(station.onBreak).toBeCloseTo(breakShare, 6);
    // Annual output: the hourly rate already holds the breaks, so it scales by the scheduled hours,
    // 3 shifts × 8 h × 7 days × 52 weeks (common trade practice).
    expect(annual / throughput).toBeCloseTo(LOOP_HOURS_PER_YEAR, 6);
  }, 60_000);

  it('belt baseline: every visit adds stop-and-locate, and the next pallet closes one pitch at belt speed', async () => {
    const spec = {
      ...fiveStations([2, 5, 8, 4, 3], {
        count: 8,
        lengthMm: 160,
        minGapMm: 40,
        vMaxMmPerS: 2_000,
        aMaxMmPerS2: 10_000,
      }),
      belt: { speedMmPerS: 250, stopAndLocateSeconds: 1.5, pitchMm: 250 },
    };
    // 8 s work + 1.5 s locate + 250 mm / 250 mm/s = 10.5 s per part: 342.9 parts/h.
    const { throughput } = await paced(spec, 'P2');
    expect(Math.abs(throughput / (3600 / (8 + 1.5 + 250 / 250)) - 1)).toBeLessThan(0.005);
  }, 60_000);
});
