// Builds small scenario documents in code, for tests and reference checks: a serial line of stations
// on a work lane with a return lane, joined end to end by direct links on one deck. Idealised lines
// (near-instant moves, long accumulation between stations, exponential stations) are a few options.
import type { Distribution } from '../../../shared/scenario/distribution';
import type { ScenarioInput } from '../../../shared/scenario/scenario';

export type StationSpec = {
  id?: string;
  cycle: Distribution;
  failures?: { timeBetweenFailuresSeconds: Distribution; timeToRepairSeconds: Distribution };
  /** Carrier places of accumulation (buffer) in front of the station. Default 0. */
  bufferBefore?: number;
  manual?: boolean;
  pausesForBreaks?: boolean;
};

export type SerialLineSpec = {
  name?: string;
  /** First is the load step, last the unload step, the rest process steps; at least two. */
  stations: StationSpec[];
  carriers: number;
  carrierLengthMm?: number;
  gapMm?: number;
  /** Default: very fast carriers, so moves are negligible against cycle times. */
  vMaxMmPerS?: number;
  aMaxMmPerS2?: number;
  /** Carrier places on the return lane. Default: room for every carrier. */
  returnPlaces?: number;
  breaks?: { startMinute: number; minutes: number }[];
  hoursPerShift?: number;
  belt?: { speedMmPerS: number; stopAndLocateSeconds: number };
};

export function serialLine(spec: SerialLineSpec): ScenarioInput {
  const length = spec.carrierLengthMm ?? 100;
  const pitch = length + (spec.gapMm ?? 0);
  let position = length;
  const last = spec.stations.length - 1;
  const steps = spec.stations.map((st, i) => {
    position += (st.bufferBefore ?? 0) * pitch + (i === 0 ? 0 : pitch);
    const id = st.id ?? `S${i + 1}`;
    const kind = i === 0 ? ('load' as const) : i === last ? ('unload' as const) : ('process' as const);
    return {
      id: `step-${id}`,
      name: `Step ${id}`,
      kind,
      stations: [
        {
          id,
          name: `Station ${id}`,
          laneId: 'work',
          positionMm: position,
          cycleTimeSeconds: st.cycle,
          failures: st.failures,
          operation: st.manual || st.pausesForBreaks ? ('manual' as const) : ('automatic' as const),
          pausesForBreaks: st.pausesForBreaks ?? false,
        },
      ],
    };
  });
  const workLength = position + pitch;
  const returnLength = Math.max(pitch, (spec.returnPlaces ?? spec.carriers) * pitch);
  return {
    schemaVersion: 1,
    name: spec.name ?? 'Test line',
    track: { moduleLengthsMm: [workLength, returnLength], widthMm: 150 },
    decks: [{ id: 'deck', name: 'Deck', elevationMm: 900 }],
    lanes: [
      {
        id: 'work',
        name: 'Work',
        deckId: 'deck',
        modules: [{ lengthMm: workLength, count: 1 }],
        start: { xMm: 0, yMm: 0 },
        heading: 'east',
      },
      {
        id: 'return',
        name: 'Return',
        deckId: 'deck',
        modules: [{ lengthMm: returnLength, count: 1 }],
        start: { xMm: workLength, yMm: 500 },
        heading: 'west',
      },
    ],
    links: [
      { fromLaneId: 'work', toLaneId: 'return' },
      { fromLaneId: 'return', toLaneId: 'work' },
    ],
    transfers: [],
    carriers: {
      count: spec.carriers,
      lengthMm: length,
      minGapMm: spec.gapMm ?? 0,
      loaded: { vMaxMmPerS: spec.vMaxMmPerS ?? 20_000, aMaxMmPerS2: spec.aMaxMmPerS2 ?? 10_000_000 },
    },
    steps,
    calendar: {
      shiftsPerDay: 1,
      hoursPerShift: spec.hoursPerShift ?? 8,
      breaks: spec.breaks ?? [],
      daysPerWeek: 5,
      weeksPerYear: 48,
    },
    conveyor: spec.belt ? { kind: 'belt', pitchMm: pitch, ...spec.belt } : { kind: 'carriers' },
  };
}
