// The benchmark's queue loop, built only for measuring: a closed loop of two 60-m lanes joined by
// direct links, three exponential stations (load, process, unload) and about 20 s of travel per lap,
// long enough to hold 1,000 carriers of 100 mm pitch. Run with 8, 50 and 1,000 carriers, it shows
// whether the engine's work per part grows with the number of carriers standing in queues.
// An invented line; all numbers are our own choices.
import type { ScenarioInput } from '../../shared/scenario/scenario';

const LANE_MM = 60_000;
export const QUEUE_LOOP_CARRIERS = [8, 50, 1_000] as const;
const PROFILE = { vMaxMmPerS: 6_500, aMaxMmPerS2: 26_000 };

const lane = (id: string, y: number, heading: 'east' | 'west') => ({
  id,
  name: id,
  deckId: 'deck',
  modules: [{ lengthMm: 1_000, count: LANE_MM / 1_000 }],
  start: { xMm: heading === 'east' ? 0 : LANE_MM, yMm: y },
  heading,
});

const station = (id: string, laneId: string, positionMm: number, mean: number) => ({
  id,
  name: id,
  laneId,
  positionMm,
  cycleTimeSeconds: { kind: 'exponential', mean },
});

/** Seconds of travel per lap for one carrier that never waits: four rest-to-rest moves of the trapezoidal profile. */
export function queueLoopTravelSeconds(): number {
  const { vMaxMmPerS: v, aMaxMmPerS2: a } = PROFILE;
  const move = (d: number) => (d >= (v * v) / a ? d / v + v / a : 2 * Math.sqrt(d / a));
  return [29_000, LANE_MM - 30_000, 30_000 - 80, LANE_MM - 30_000, 1_000 - 80].reduce((s, d) => s + move(d), 0);
}

export function queueLoop(carriers: number): ScenarioInput {
  return {
    schemaVersion: 1,
    name: `Bench: queue loop, ${carriers} carriers`,
    track: { moduleLengthsMm: [1_000], widthMm: 200 },
    decks: [{ id: 'deck', name: 'Deck', elevationMm: 900 }],
    lanes: [lane('out', 0, 'east'), lane('back', 600, 'west')],
    links: [
      { fromLaneId: 'out', toLaneId: 'back' },
      { fromLaneId: 'back', toLaneId: 'out' },
    ],
    transfers: [],
    carriers: { count: carriers, lengthMm: 80, minGapMm: 20, loaded: PROFILE },
    steps: [
      { id: 'load', name: 'load', kind: 'load', stations: [station('LD', 'out', 1_000, 3)] },
      { id: 'work', name: 'work', kind: 'process', stations: [station('WK', 'out', 30_000, 4)] },
      { id: 'unload', name: 'unload', kind: 'unload', stations: [station('UL', 'back', 30_000, 3.5)] },
    ],
    calendar: { shiftsPerDay: 3, hoursPerShift: 8, breaks: [], daysPerWeek: 5, weeksPerYear: 46 },
    conveyor: { kind: 'carriers' },
  } as ScenarioInput;
}
