// Builds small closed-loop scenarios for the reference checks: two lanes joined end to start (work
// lane, then return lane, then back) by direct links or by transfers, stations in process order, and
// carriers with a trapezoidal profile. Each check chooses sizes that make the physical effects it is
// not about negligible, and says so beside the check.
import type { Distribution } from '../../../shared/scenario/distribution';
import type { ScenarioInput } from '../../../shared/scenario/scenario';

export type LoopStation = {
  id: string;
  /** 0: work lane, 1: return lane. */
  lane: 0 | 1;
  positionMm: number;
  cycle: Distribution;
  /** A manual station that stops for the calendar's breaks. */
  manual?: boolean;
  /** Makes the station's step an inspection; rework goes back to the step of station reworkTo. */
  inspect?: { rejectShare: number; reworkShare: number; reworkTo: string };
  failures?: { timeBetweenFailuresSeconds: Distribution; timeToRepairSeconds: Distribution };
};

/** How one lane end joins the other lane's start; a direct link when absent. */
export type LoopJoin =
  | { kind: 'elevator'; handlingSeconds: number; liftSpeedMmPerS: number }
  | { kind: 'lateral'; handlingSeconds: number; shiftDistanceMm: number; shiftSpeedMmPerS: number }
  | { kind: 'curve'; lengthMm: number; speedLimitMmPerS: number };

export type LoopLine = {
  laneLengthsMm: [number, number];
  /** Work-lane end to return-lane start, and return-lane end to work-lane start. Elevators need both. */
  joins?: [LoopJoin, LoopJoin];
  /** In process order: the first is the load step, the last the unload step, the rest process steps. */
  stations: LoopStation[];
  carriers: {
    count: number;
    lengthMm: number;
    minGapMm: number;
    vMaxMmPerS: number;
    aMaxMmPerS2: number;
    empty?: { vMaxMmPerS: number; aMaxMmPerS2: number };
  };
  /** The belt baseline instead of independent carriers. */
  belt?: { speedMmPerS: number; stopAndLocateSeconds: number; pitchMm: number };
  /** Breaks of every 8-hour shift, minutes from its start; none when absent. */
  breaks?: { startMinute: number; minutes: number }[];
};

/** Three 8-hour shifts a day, seven days a week, 52 weeks. */
export const LOOP_HOURS_PER_YEAR = 3 * 8 * 7 * 52;

/** Standard modules of 1000, 100, 10 and 1 mm, so a lane can take any whole length in millimetres. */
const MODULES = [1000, 100, 10, 1];

function modulesFor(lengthMm: number): { lengthMm: number; count: number }[] {
  if (!Number.isInteger(lengthMm) || lengthMm <= 0)
    throw new RangeError(`lane length ${lengthMm} mm must be a positive whole number`);
  const out: { lengthMm: number; count: number }[] = [];
  let rest = lengthMm;
  for (const m of MODULES) {
    const count = Math.floor(rest / m);
    if (count > 0) out.push({ lengthMm: m, count });
    rest -= count * m;
  }
  return out;
}

export const LANE_IDS = ['work', 'return'] as const;

/** With elevators the return lane runs on a deck 400 mm below the work deck. */
export const DECK_DROP_MM = 400;

function joinsOf(spec: LoopLine) {
  if (!spec.joins)
    return {
      links: [
        { fromLaneId: 'work', toLaneId: 'return' },
        { fromLaneId: 'return', toLaneId: 'work' },
      ],
      transfers: [],
    };
  const ends = [
    ['work', 'return'],
    ['return', 'work'],
  ] as const;
  return {
    links: [],
    transfers: spec.joins.map((j, i) => ({
      id: `join-${i}`,
      name: `Join ${i}`,
      fromLaneId: ends[i][0],
      toLaneId: ends[i][1],
      ...j,
    })),
  };
}

export function loopScenario(spec: LoopLine, name = 'Reference loop'): ScenarioInput {
  const last = spec.stations.length - 1;
  const twoDecks = spec.joins?.[0].kind === 'elevator';
  const stepKind = (i: number) =>
    i === 0 ? 'load' : i === last ? 'unload' : spec.stations[i].inspect ? 'inspect' : 'process';
  const inspection = (st: LoopStation) =>
    st.inspect
      ? {
          rejectShare: st.inspect.rejectShare,
          reworkShare: st.inspect.reworkShare,
          reworkStepId: `step-${st.inspect.reworkTo}`,
        }
      : {};
  return {
    schemaVersion: 1,
    name,
    track: { moduleLengthsMm: MODULES, widthMm: 200 },
    decks: [
      { id: 'deck', name: 'Deck', elevationMm: 900 },
      { id: 'lower', name: 'Lower deck', elevationMm: 900 - DECK_DROP_MM },
    ],
    lanes: spec.laneLengthsMm.map((length, i) => ({
      id: LANE_IDS[i],
      name: LANE_IDS[i],
      deckId: twoDecks && i === 1 ? 'lower' : 'deck',
      modules: modulesFor(length),
      start: { xMm: i === 0 ? 0 : length, yMm: i * 500 },
      heading: i === 0 ? 'east' : 'west',
    })),
    ...joinsOf(spec),
    carriers: {
      count: spec.carriers.count,
      lengthMm: spec.carriers.lengthMm,
      minGapMm: spec.carriers.minGapMm,
      loaded: { vMaxMmPerS: spec.carriers.vMaxMmPerS, aMaxMmPerS2: spec.carriers.aMaxMmPerS2 },
      ...(spec.carriers.empty ? { empty: spec.carriers.empty } : {}),
    },
    steps: spec.stations.map((st, i) => ({
      id: `step-${st.id}`,
      name: `Step ${st.id}`,
      kind: stepKind(i),
      dispatch: 'firstFree',
      ...inspection(st),
      stations: [
        {
          id: st.id,
          name: `Station ${st.id}`,
          laneId: LANE_IDS[st.lane],
          positionMm: st.positionMm,
          cycleTimeSeconds: st.cycle,
          ...(st.manual ? { operation: 'manual', pausesForBreaks: true } : {}),
          ...(st.failures ? { failures: st.failures } : {}),
        },
      ],
    })),
    calendar: { shiftsPerDay: 3, hoursPerShift: 8, breaks: spec.breaks ?? [], daysPerWeek: 7, weeksPerYear: 52 },
    conveyor: spec.belt ? { kind: 'belt', ...spec.belt } : { kind: 'carriers' },
  } as ScenarioInput;
}
