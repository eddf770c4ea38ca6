// The benchmark's large line, built in code so its size is fixed by this file: three decks (two work
// decks and a return deck of two lanes), elevators between the decks, a lateral transfer on the
// return deck, 20 stations in 17 steps with every kind of cycle-time distribution, failures on the
// automatic stations, manual stations that stop for the breaks of one 8-hour shift, and 50 carriers.
// For measuring how costs grow with the line's size, the work decks can be repeated: each copy adds
// 12 m to the upper and middle lanes and the 17 stations of their steps (and 50 carriers).
// An invented line; all numbers are our own choices.
import type { Distribution } from '../../shared/scenario/distribution';
import type { ScenarioInput } from '../../shared/scenario/scenario';

type StationSpec = { id: string; lane: string; at: number; cycle: Distribution; manual?: boolean; fails?: boolean };
type StepSpec = {
  id: string;
  kind: 'load' | 'process' | 'inspect' | 'unload';
  stations: StationSpec[];
  dispatch?: 'firstFree' | 'shortestQueue' | 'roundRobin';
};

const LANE_MM = 12_000;
const lane = (id: string, deckId: string, x: number, y: number, heading: 'east' | 'west', copies = 1) => ({
  id,
  name: id,
  deckId,
  modules: [{ lengthMm: 1_000, count: (copies * LANE_MM) / 1_000 }],
  start: { xMm: x, yMm: y },
  heading,
});

const tri = (min: number, mode: number, max: number): Distribution => ({ kind: 'triangular', min, mode, max });

/** A manual step done at several positions of one lane: stations <prefix>1, <prefix>2, … */
const parallel = (
  id: string,
  dispatch: StepSpec['dispatch'],
  lane: string,
  prefix: string,
  positions: number[],
  cycle: Distribution,
): StepSpec => ({
  id,
  kind: 'process',
  dispatch,
  stations: positions.map((at, i) => ({ id: `${prefix}${i + 1}`, lane, at, cycle, manual: true })),
});

const STEPS: StepSpec[] = [
  {
    id: 'load',
    kind: 'load',
    stations: [{ id: 'LD', lane: 'top', at: 600, cycle: { kind: 'normal', mean: 4, sd: 0.8, min: 2.5 }, manual: true }],
  },
  {
    id: 'base',
    kind: 'process',
    stations: [{ id: 'BS', lane: 'top', at: 1_600, cycle: { kind: 'fixed', value: 4.5 }, fails: true }],
  },
  {
    id: 'seal',
    kind: 'process',
    stations: [{ id: 'SL', lane: 'top', at: 2_600, cycle: { kind: 'lognormal', mean: 4, cv: 0.2 }, fails: true }],
  },
  parallel('wind', 'shortestQueue', 'top', 'WD', [3_800, 4_800], tri(8, 10, 14)),
  {
    id: 'glue',
    kind: 'process',
    stations: [{ id: 'GL', lane: 'top', at: 6_000, cycle: { kind: 'erlang', mean: 4, k: 4 }, fails: true }],
  },
  {
    id: 'cure',
    kind: 'process',
    stations: [{ id: 'CU', lane: 'top', at: 7_200, cycle: { kind: 'fixed', value: 4.8 } }],
  },
  {
    id: 'pins',
    kind: 'process',
    stations: [{ id: 'PN', lane: 'top', at: 8_400, cycle: { kind: 'gamma', mean: 3.5, cv: 0.3 }, fails: true }],
  },
  {
    id: 'probe',
    kind: 'inspect',
    stations: [{ id: 'PB', lane: 'top', at: 9_600, cycle: { kind: 'uniform', min: 3, max: 5 } }],
  },
  {
    id: 'press',
    kind: 'process',
    stations: [{ id: 'PR', lane: 'top', at: 10_800, cycle: { kind: 'fixed', value: 4.6 }, fails: true }],
  },
  parallel('fit', 'roundRobin', 'mid', 'FT', [1_200, 2_400, 3_600], tri(9, 12, 16)),
  {
    id: 'screw',
    kind: 'process',
    stations: [{ id: 'SC', lane: 'mid', at: 5_000, cycle: { kind: 'lognormal', mean: 3.8, cv: 0.15 }, fails: true }],
  },
  {
    id: 'label',
    kind: 'process',
    stations: [
      {
        id: 'LB',
        lane: 'mid',
        at: 6_400,
        cycle: { kind: 'empirical', samples: [3.1, 3.4, 3.2, 3.9, 3.3, 3.6, 4.4, 3.2] },
      },
    ],
  },
  {
    id: 'leak',
    kind: 'inspect',
    stations: [{ id: 'LK', lane: 'mid', at: 7_800, cycle: { kind: 'fixed', value: 4.2 }, fails: true }],
  },
  {
    id: 'flash',
    kind: 'process',
    stations: [{ id: 'FL', lane: 'mid', at: 9_200, cycle: { kind: 'exponential', mean: 2 } }],
  },
  {
    id: 'final',
    kind: 'inspect',
    stations: [{ id: 'FI', lane: 'mid', at: 10_600, cycle: tri(3, 4, 5), manual: true }],
  },
  {
    id: 'mark',
    kind: 'process',
    stations: [{ id: 'MK', lane: 'low-out', at: 1_000, cycle: { kind: 'fixed', value: 2.5 } }],
  },
  {
    id: 'unload',
    kind: 'unload',
    stations: [{ id: 'UL', lane: 'low-out', at: 2_400, cycle: { kind: 'fixed', value: 3 } }],
  },
];

/** Steps of the work decks (upper and middle lane), which a larger bench line repeats. */
const REPEATED = new Set(['top', 'mid']);

/** Copy k of a work-deck step: ids suffixed, positions 12 m further along its lane. */
function copyOf(s: StepSpec, k: number): StepSpec {
  if (k === 0) return s;
  return {
    ...s,
    id: `${s.id}-${k}`,
    stations: s.stations.map((st) => ({ ...st, id: `${st.id}-${k}`, at: st.at + k * LANE_MM })),
  };
}

function stepsFor(copies: number): StepSpec[] {
  const load = STEPS.filter((s) => s.kind === 'load');
  const onLane = (lane: string) => STEPS.filter((s) => s.kind !== 'load' && s.stations[0].lane === lane);
  const repeated = (lane: string) =>
    Array.from({ length: copies }, (_, k) => onLane(lane).map((s) => copyOf(s, k))).flat();
  const rest = STEPS.filter((s) => s.kind !== 'load' && !REPEATED.has(s.stations[0].lane));
  return [...load, ...repeated('top'), ...repeated('mid'), ...rest];
}

function step(s: StepSpec, index: number) {
  const copy = s.id.includes('-') ? s.id.slice(s.id.indexOf('-')) : '';
  const base = {
    id: s.id,
    name: s.id,
    kind: s.kind,
    dispatch: s.dispatch ?? 'firstFree',
    stations: s.stations.map((st) => ({
      id: st.id,
      name: st.id,
      laneId: st.lane,
      positionMm: st.at,
      cycleTimeSeconds: st.cycle,
      operation: st.manual ? 'manual' : 'automatic',
      pausesForBreaks: st.manual === true,
      ...(st.fails
        ? {
            failures: {
              timeBetweenFailuresSeconds: { kind: 'exponential', mean: 3_600 + 600 * index },
              timeToRepairSeconds: { kind: 'lognormal', mean: 150, cv: 0.6 },
            },
          }
        : {}),
    })),
  };
  if (s.id === `probe${copy}`) return { ...base, rejectShare: 0.01, reworkShare: 0.03, reworkStepId: `glue${copy}` };
  if (s.id === `leak${copy}`) return { ...base, rejectShare: 0.015, reworkShare: 0.02, reworkStepId: `screw${copy}` };
  if (s.id === `final${copy}`) return { ...base, rejectShare: 0.005 };
  return base;
}

export const largeLineStations = (copies = 1) => stepsFor(copies).reduce((n, s) => n + s.stations.length, 0);

export function largeLine(carriers = 50, copies = 1): ScenarioInput {
  return {
    schemaVersion: 1,
    name: 'Bench: three-deck sensor-module line',
    description: 'Invented benchmark line: work on the top and middle decks, empty return on the bottom deck.',
    track: { moduleLengthsMm: [250, 500, 1_000], widthMm: 200 },
    decks: [
      { id: 'upper', name: 'Upper work deck', elevationMm: 1_500 },
      { id: 'middle', name: 'Middle work deck', elevationMm: 1_100 },
      { id: 'lower', name: 'Return deck', elevationMm: 700 },
    ],
    lanes: [
      lane('top', 'upper', 0, 0, 'east', copies),
      lane('mid', 'middle', copies * LANE_MM, 0, 'west', copies),
      lane('low-out', 'lower', 0, 0, 'east'),
      lane('low-back', 'lower', LANE_MM, 600, 'west'),
    ],
    links: [],
    transfers: [
      {
        id: 'lift-east',
        name: 'Elevator east',
        kind: 'elevator',
        fromLaneId: 'top',
        toLaneId: 'mid',
        handlingSeconds: 1.2,
        liftSpeedMmPerS: 600,
      },
      {
        id: 'lift-west',
        name: 'Elevator west',
        kind: 'elevator',
        fromLaneId: 'mid',
        toLaneId: 'low-out',
        handlingSeconds: 1.2,
        liftSpeedMmPerS: 600,
      },
      {
        id: 'shift-east',
        name: 'Lateral east',
        kind: 'lateral',
        fromLaneId: 'low-out',
        toLaneId: 'low-back',
        handlingSeconds: 1,
        shiftDistanceMm: 600,
        shiftSpeedMmPerS: 500,
      },
      {
        id: 'lift-return',
        name: 'Return elevator',
        kind: 'elevator',
        fromLaneId: 'low-back',
        toLaneId: 'top',
        handlingSeconds: 1.2,
        liftSpeedMmPerS: 800,
      },
    ],
    carriers: {
      count: carriers,
      lengthMm: 160,
      minGapMm: 40,
      loaded: { vMaxMmPerS: 2_000, aMaxMmPerS2: 10_000, jMaxMmPerS3: 400_000 },
      empty: { vMaxMmPerS: 2_500, aMaxMmPerS2: 20_000 },
    },
    steps: stepsFor(copies).map(step),
    calendar: {
      shiftsPerDay: 1,
      hoursPerShift: 8,
      breaks: [
        { startMinute: 120, minutes: 15 },
        { startMinute: 240, minutes: 30 },
        { startMinute: 390, minutes: 15 },
      ],
      daysPerWeek: 5,
      weeksPerYear: 46,
    },
    targetTaktSeconds: 5,
    conveyor: { kind: 'carriers' },
  } as ScenarioInput;
}
