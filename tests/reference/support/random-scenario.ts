// fast-check arbitraries for whole valid scenarios: a ring of 2–5 lanes on one or two decks joined
// by links, lateral transfers, curves and elevators, stations on random free places, every kind of
// cycle-time distribution, failures, inspections with reject and rework, manual stations on breaks,
// and sometimes the belt baseline. Carriers fill at most half the track, so a lock-up is a finding.
import fc from 'fast-check';
import type { Distribution } from '../../../shared/scenario/distribution';
import type { ScenarioInput } from '../../../shared/scenario/scenario';

const MODULES = [250, 500, 1000];

const time = (lo: number, hi: number) => fc.double({ min: lo, max: hi, noNaN: true, noDefaultInfinity: true });

export const distribution: fc.Arbitrary<Distribution> = fc.oneof(
  time(0.5, 20).map((value) => ({ kind: 'fixed' as const, value })),
  fc.tuple(time(0.2, 10), time(0.1, 10)).map(([min, span]) => ({ kind: 'uniform' as const, min, max: min + span })),
  fc
    .tuple(time(0.2, 10), time(0, 1), time(0.1, 10))
    .map(([min, at, span]) => ({ kind: 'triangular' as const, min, mode: min + at * span, max: min + span })),
  fc
    .tuple(time(1, 15), time(0.1, 4), time(0, 1))
    .map(([mean, sd, cut]) => ({ kind: 'normal' as const, mean, sd, min: cut * mean })),
  fc.tuple(time(0.5, 15), time(0.05, 2)).map(([mean, cv]) => ({ kind: 'lognormal' as const, mean, cv })),
  time(0.5, 15).map((mean) => ({ kind: 'exponential' as const, mean })),
  fc.tuple(time(0.5, 15), fc.integer({ min: 1, max: 12 })).map(([mean, k]) => ({ kind: 'erlang' as const, mean, k })),
  fc.tuple(time(0.5, 15), time(0.05, 2)).map(([mean, cv]) => ({ kind: 'gamma' as const, mean, cv })),
  fc
    .array(time(0, 12), { minLength: 1, maxLength: 20 })
    .map((s) => ({ kind: 'empirical' as const, samples: [...s, 1] })),
);

const profile = fc
  .record({
    vMaxMmPerS: time(100, 5_000),
    aMaxMmPerS2: time(500, 50_000),
    jMaxMmPerS3: fc.option(time(5_000, 2_000_000), { nil: undefined }),
  })
  .map((p) => (p.jMaxMmPerS3 === undefined ? { vMaxMmPerS: p.vMaxMmPerS, aMaxMmPerS2: p.aMaxMmPerS2 } : p));

type Raw = {
  lanes: { modules: { lengthMm: number; count: number }[]; deck: number }[];
  joins: number[];
  carrier: { lengthMm: number; minGapMm: number };
  loaded: { vMaxMmPerS: number; aMaxMmPerS2: number; jMaxMmPerS3?: number };
  empty: { vMaxMmPerS: number; aMaxMmPerS2: number; jMaxMmPerS3?: number } | undefined;
  steps: {
    kind: 'process' | 'inspect';
    stations: number;
    dispatch: number;
    reject: number;
    rework: number;
    reworkTo: number;
  }[];
  ends: { loadStations: number; unloadStations: number };
  stations: {
    lane: number;
    at: number;
    cycle: Distribution;
    manual: boolean;
    failures: [Distribution, Distribution] | null;
  }[];
  fill: number;
  belt: { speedMmPerS: number; stopAndLocateSeconds: number; extraPitchMm: number } | null;
  breaks: boolean;
};

const raw: fc.Arbitrary<Raw> = fc.record({
  lanes: fc.array(
    fc.record({
      modules: fc.array(fc.record({ lengthMm: fc.constantFrom(...MODULES), count: fc.integer({ min: 1, max: 6 }) }), {
        minLength: 1,
        maxLength: 3,
      }),
      deck: fc.integer({ min: 0, max: 1 }),
    }),
    { minLength: 2, maxLength: 5 },
  ),
  joins: fc.array(fc.integer({ min: 0, max: 2 }), { minLength: 5, maxLength: 5 }),
  carrier: fc.record({ lengthMm: fc.integer({ min: 40, max: 240 }), minGapMm: fc.integer({ min: 0, max: 80 }) }),
  loaded: profile,
  empty: fc.option(profile, { nil: undefined }),
  steps: fc.array(
    fc.record({
      kind: fc.constantFrom('process' as const, 'inspect' as const),
      stations: fc.integer({ min: 1, max: 3 }),
      dispatch: fc.integer({ min: 0, max: 3 }),
      reject: time(0, 0.2),
      rework: time(0, 0.2),
      reworkTo: fc.nat(),
    }),
    { maxLength: 4 },
  ),
  ends: fc.record({ loadStations: fc.integer({ min: 1, max: 2 }), unloadStations: fc.integer({ min: 1, max: 2 }) }),
  stations: fc.array(
    fc.record({
      lane: fc.nat(),
      at: fc.double({ min: 0, max: 1, noNaN: true }),
      cycle: distribution,
      manual: fc.boolean(),
      failures: fc.option(
        fc.tuple(
          time(30, 3_000).map((mean) => ({ kind: 'exponential' as const, mean })),
          distribution,
        ),
        { nil: null },
      ),
    }),
    { minLength: 16, maxLength: 16 },
  ),
  fill: fc.double({ min: 0.02, max: 0.5, noNaN: true }),
  belt: fc.option(
    fc.record({
      speedMmPerS: time(100, 1_000),
      stopAndLocateSeconds: time(0, 2),
      extraPitchMm: fc.integer({ min: 0, max: 100 }),
    }),
    { nil: null, freq: 5 },
  ),
  breaks: fc.boolean(),
});

const DISPATCH = ['pooled', 'firstFree', 'shortestQueue', 'roundRobin'] as const;

/** Places stations on free slots of the pitch grid, so no two on a lane are closer than one pitch. */
function place(r: Raw, laneLengths: number[], pitch: number, wanted: number) {
  const used = laneLengths.map(() => new Set<number>());
  const slots = laneLengths.map((len) => Math.floor((len - r.carrier.lengthMm) / pitch) + 1);
  const out: { laneIndex: number; positionMm: number }[] = [];
  for (let i = 0; i < wanted; i++) {
    const st = r.stations[i % r.stations.length];
    let lane = st.lane % laneLengths.length;
    let slot = Math.min(slots[lane] - 1, Math.floor(st.at * slots[lane]));
    while (used[lane].has(slot)) {
      slot++;
      if (slot >= slots[lane]) {
        slot = 0;
        lane = (lane + 1) % laneLengths.length;
      }
    }
    used[lane].add(slot);
    out.push({ laneIndex: lane, positionMm: r.carrier.lengthMm + slot * pitch });
  }
  return out;
}

function build(r: Raw): ScenarioInput {
  const laneLengths = r.lanes.map((l) => l.modules.reduce((s, m) => s + m.lengthMm * m.count, 0));
  const beltPitch = r.carrier.lengthMm + (r.belt?.extraPitchMm ?? 0);
  // Stations are spaced by the larger of the carrier pitch and, on a belt, the pallet pitch.
  const pitch = Math.max(r.carrier.lengthMm + r.carrier.minGapMm, r.belt ? beltPitch : 0);
  const laneIds = r.lanes.map((_, i) => `lane-${i}`);
  const links: { fromLaneId: string; toLaneId: string }[] = [];
  const transfers: Record<string, unknown>[] = [];
  r.lanes.forEach((lane, i) => {
    const next = (i + 1) % r.lanes.length;
    const from = laneIds[i];
    const to = laneIds[next];
    const id = `join-${i}`;
    if (lane.deck !== r.lanes[next].deck)
      transfers.push({
        id,
        name: id,
        kind: 'elevator',
        fromLaneId: from,
        toLaneId: to,
        handlingSeconds: 1 + r.joins[i],
        liftSpeedMmPerS: 400,
      });
    else if (r.joins[i] === 0) links.push({ fromLaneId: from, toLaneId: to });
    else if (r.joins[i] === 1)
      transfers.push({
        id,
        name: id,
        kind: 'lateral',
        fromLaneId: from,
        toLaneId: to,
        handlingSeconds: 1,
        shiftDistanceMm: 500,
        shiftSpeedMmPerS: 400,
      });
    else
      transfers.push({
        id,
        name: id,
        kind: 'curve',
        fromLaneId: from,
        toLaneId: to,
        lengthMm: 700,
        speedLimitMmPerS: 600,
      });
  });
  const slots = laneLengths.reduce((sum, len) => sum + Math.floor((len - r.carrier.lengthMm) / pitch) + 1, 0);
  // Every step needs a place: keep only as many process steps as the track has room for.
  const middle = r.steps.slice(0, Math.max(0, slots - 2));
  const wanted = [r.ends.loadStations, ...middle.map((s) => s.stations), r.ends.unloadStations];
  // First one station per step, then the extra parallel stations while places remain.
  const order = [...wanted.map((_, i) => i), ...wanted.flatMap((n, i) => Array.from({ length: n - 1 }, () => i))].slice(
    0,
    slots,
  );
  const places = place(r, laneLengths, pitch, order.length);
  const stationsOf = wanted.map(() => [] as number[]);
  order.forEach((stepIndex, k) => stationsOf[stepIndex].push(k));
  const last = wanted.length - 1;
  const stepDefs = stationsOf.map((members, i) => {
    const kind = i === 0 ? 'load' : i === last ? 'unload' : middle[i - 1].kind;
    const stations = members.map((k) => {
      const st = r.stations[k % r.stations.length];
      return {
        id: `st-${k}`,
        name: `Station ${k}`,
        laneId: laneIds[places[k].laneIndex],
        positionMm: places[k].positionMm,
        cycleTimeSeconds: st.cycle,
        operation: st.manual ? 'manual' : 'automatic',
        pausesForBreaks: st.manual && r.breaks,
        ...(st.failures
          ? { failures: { timeBetweenFailuresSeconds: st.failures[0], timeToRepairSeconds: st.failures[1] } }
          : {}),
      };
    });
    const base = {
      id: `step-${i}`,
      name: `Step ${i}`,
      kind,
      dispatch: DISPATCH[i > 0 && i < last ? middle[i - 1].dispatch : 0],
      stations,
    };
    if (kind !== 'inspect') return base;
    const s = middle[i - 1];
    return { ...base, rejectShare: s.reject, reworkShare: s.rework, reworkStepId: `step-${1 + (s.reworkTo % i)}` };
  });
  const capacity = laneLengths.reduce((sum, len) => sum + Math.floor(len / pitch), 0);
  return {
    schemaVersion: 1,
    name: 'Random property line',
    track: { moduleLengthsMm: MODULES, widthMm: 200 },
    decks: [
      { id: 'd0', name: 'Deck 0', elevationMm: 900 },
      { id: 'd1', name: 'Deck 1', elevationMm: 500 },
    ],
    lanes: r.lanes.map((lane, i) => ({
      id: laneIds[i],
      name: laneIds[i],
      deckId: `d${lane.deck}`,
      modules: lane.modules,
      start: { xMm: 0, yMm: i * 400 },
      heading: 'east',
    })),
    links,
    transfers,
    carriers: {
      count: Math.max(1, Math.floor(r.fill * capacity)),
      lengthMm: r.carrier.lengthMm,
      minGapMm: r.carrier.minGapMm,
      loaded: r.loaded,
      ...(r.empty ? { empty: r.empty } : {}),
    },
    steps: stepDefs,
    calendar: {
      shiftsPerDay: 2,
      hoursPerShift: 8,
      breaks: r.breaks
        ? [
            { startMinute: 5, minutes: 10 },
            { startMinute: 40, minutes: 5 },
          ]
        : [],
      daysPerWeek: 5,
      weeksPerYear: 46,
    },
    conveyor: r.belt
      ? {
          kind: 'belt',
          speedMmPerS: r.belt.speedMmPerS,
          stopAndLocateSeconds: r.belt.stopAndLocateSeconds,
          pitchMm: beltPitch,
        }
      : { kind: 'carriers' },
  } as ScenarioInput;
}

export const randomScenario: fc.Arbitrary<ScenarioInput> = raw.map(build);
