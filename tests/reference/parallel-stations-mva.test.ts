// Two parallel exponential stations behind a split act as one two-server station when the step's
// stations are pooled: checked against exact load-dependent Mean Value Analysis (Reiser &
// Lavenberg, "Mean-value analysis of closed multichain queuing networks", J. ACM 27(2), 1980), with
// the two stations as one FCFS station of two servers (service rate min(j, 2)/s with j present).
//
// The layout: a long infeed lane with the load station, a split at its end by direct links onto two
// lanes one carrier long whose only place is the station, a merge by direct links onto a long lane
// with the unload station, and a link back to the infeed. Each fitting lane holds one carrier, so a
// pooled carrier waits at the infeed's end until one of the two stations is free: the infeed's end
// is the two servers' shared queue. As in the single-server MVA check, 5 mm carriers at 20 m/s and
// 10^8 mm/s² make close-up moves and exchanges negligible (under 0.5 ms against cycle times of
// seconds), queues of at most 8 carriers take 40 mm of a 60 m lane, and travel is one deterministic
// delay node (insensitive to its distribution: Baskett, Chandy, Muntz & Palacios, J. ACM 22(2), 1975).
import { describe, expect, it } from 'vitest';
import type { ScenarioInput } from '../../shared/scenario/scenario';
import { mvaThroughput, trapezoidMoveSeconds } from './support/queueing';
import { interval, replicationThroughputs, simulate } from './support/run';

const V = 20_000;
const A = 100_000_000;
const LENGTH = 5;
const LANE = 60_000;
/** Load, each of the two parallel stations, unload. */
const MEANS = { load: 1.5, fit: 5, unload: 2 };
const MAX_N = 8;

type Rule = 'pooled' | 'shortestQueue';

const lane = (id: string, lengthMm: number, x: number, y: number) => ({
  id,
  name: id,
  deckId: 'deck',
  modules: lengthMm === LENGTH ? [{ lengthMm: LENGTH, count: 1 }] : [{ lengthMm: 1_000, count: lengthMm / 1_000 }],
  start: { xMm: x, yMm: y },
  heading: 'east',
});

const station = (id: string, laneId: string, positionMm: number, mean: number) => ({
  id,
  name: id,
  laneId,
  positionMm,
  cycleTimeSeconds: { kind: 'exponential', mean },
});

function splitLoop(count: number, dispatch: Rule): ScenarioInput {
  return {
    schemaVersion: 1,
    name: 'Two parallel stations behind a split',
    track: { moduleLengthsMm: [1_000, LENGTH], widthMm: 200 },
    decks: [{ id: 'deck', name: 'Deck', elevationMm: 900 }],
    lanes: [
      lane('in', LANE, 0, 0),
      lane('a', LENGTH, LANE, 0),
      lane('b', LENGTH, LANE, 400),
      lane('out', LANE, LANE + LENGTH, 0),
    ],
    links: [
      { fromLaneId: 'in', toLaneId: 'a' },
      { fromLaneId: 'in', toLaneId: 'b' },
      { fromLaneId: 'a', toLaneId: 'out' },
      { fromLaneId: 'b', toLaneId: 'out' },
      { fromLaneId: 'out', toLaneId: 'in' },
    ],
    transfers: [],
    carriers: { count, lengthMm: LENGTH, minGapMm: 0, loaded: { vMaxMmPerS: V, aMaxMmPerS2: A } },
    steps: [
      { id: 'load', name: 'Load', kind: 'load', stations: [station('LD', 'in', 1_000, MEANS.load)] },
      {
        id: 'fit',
        name: 'Fit',
        kind: 'process',
        dispatch,
        stations: [station('FA', 'a', LENGTH, MEANS.fit), station('FB', 'b', LENGTH, MEANS.fit)],
      },
      { id: 'unload', name: 'Unload', kind: 'unload', stations: [station('UL', 'out', 30_000, MEANS.unload)] },
    ],
    calendar: { shiftsPerDay: 3, hoursPerShift: 8, breaks: [], daysPerWeek: 7, weeksPerYear: 52 },
    conveyor: { kind: 'carriers' },
  } as ScenarioInput;
}

/** Rest-to-rest moves of one loop: LD → infeed end | link, the fitting station is the lane's only place | link | → UL → end | link | → LD. */
const LOOP_MOVES_MM = [LANE - 1_000, 30_000 - LENGTH, LANE - 30_000, 1_000 - LENGTH];
const TRAVEL_SECONDS = LOOP_MOVES_MM.reduce((sum, d) => sum + trapezoidMoveSeconds(d, V, A), 0);
const exact = mvaThroughput([MEANS.load, MEANS.fit, MEANS.unload], TRAVEL_SECONDS, MAX_N, [1, 2, 1]).map(
  (x) => x * 3600,
);
const SETTINGS = { hours: 8, warmupMinutes: 30, replications: 10, seed: 'two-server' } as const;

describe('two pooled parallel stations against a two-server station of exact load-dependent MVA (Reiser & Lavenberg 1980)', () => {
  it('the two servers matter: with 8 carriers the pair carries clearly more than one server could', () => {
    expect(exact[MAX_N - 1]).toBeGreaterThan(1.3 * (3600 / MEANS.fit));
  });

  // Eight comparisons in one family: each interval at the Bonferroni level 1 − 0.05/8.
  it.each(Array.from({ length: MAX_N }, (_, i) => i + 1))(
    'N = %i carriers: throughput within the replication interval of MVA',
    async (n) => {
      const result = await simulate(splitLoop(n, 'pooled'), SETTINGS);
      const ci = interval(replicationThroughputs(result), 1 - 0.05 / MAX_N);
      // The check must be able to fail: the interval is narrower than 2 % of the mean.
      expect(ci.halfWidth / ci.mean).toBeLessThan(0.02);
      expect(exact[n - 1]).toBeGreaterThanOrEqual(ci.low);
      expect(exact[n - 1]).toBeLessThanOrEqual(ci.high);
    },
    120_000,
  );

  it('choosing the station on leaving loading (shortest queue) does not pool: one station idles while a carrier waits for the other', async () => {
    const n = 4;
    const result = await simulate(splitLoop(n, 'shortestQueue'), SETTINGS);
    const ci = interval(replicationThroughputs(result));
    expect(ci.high).toBeLessThan(exact[n - 1]);
  }, 120_000);
});
