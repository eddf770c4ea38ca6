// Turns a validated scenario into the flat, index-based description the simulation runs on: lanes,
// connections (direct links and transfers), stations and steps as numbered entries in typed arrays,
// plus routing tables. Done once per experiment; replications share it.
import type { Scenario } from '../../../shared/scenario/scenario';
import { laneLengthMm } from '../../../shared/scenario/track';
import {
  asIndexArray,
  indexArray,
  NONE,
  type IndexArray,
  type LaneIndex,
  type StationIndex,
  type StepIndex,
} from './indexes';
import { createMotion, type Motion } from './motion';
import { computeRoutes, type Routes } from './routing';

export const CONN_LINK = 0;
export const CONN_ELEVATOR = 1;
export const CONN_LATERAL = 2;
export const CONN_CURVE = 3;

export const STEP_LOAD = 0;
export const STEP_PROCESS = 1;
export const STEP_INSPECT = 2;
export const STEP_UNLOAD = 3;

export const DISPATCH_FIRST_FREE = 0;
export const DISPATCH_SHORTEST_QUEUE = 1;
export const DISPATCH_ROUND_ROBIN = 2;
export const DISPATCH_POOLED = 3;

const STEP_CODES = { load: STEP_LOAD, process: STEP_PROCESS, inspect: STEP_INSPECT, unload: STEP_UNLOAD } as const;
const DISPATCH_CODES = {
  pooled: DISPATCH_POOLED,
  firstFree: DISPATCH_FIRST_FREE,
  shortestQueue: DISPATCH_SHORTEST_QUEUE,
  roundRobin: DISPATCH_ROUND_ROBIN,
} as const;
const CONN_CODES = { elevator: CONN_ELEVATOR, lateral: CONN_LATERAL, curve: CONN_CURVE } as const;

export type CompiledLine = {
  scenario: Scenario;
  carrierCount: number;
  carrierLengthMm: number;
  /** Carrier length plus minimum gap: the spacing of queued carriers. */
  pitchMm: number;
  motion: Motion;
  /** Added to every station visit in belt mode (stop and locate the pallet). */
  locateSeconds: number;
  laneCount: number;
  laneLengthMm: Float64Array;
  connCount: number;
  connKind: Int32Array;
  connFrom: IndexArray<LaneIndex>;
  connTo: IndexArray<LaneIndex>;
  /** Transfer index (into scenario.transfers) of a connection, -1 for a direct link. */
  connTransfer: Int32Array;
  /** Seconds from taking a carrier in to being ready to hand it over. */
  connCarrySeconds: Float64Array;
  /** Seconds an elevator or lateral transfer needs to come back empty after handing over. */
  connReturnSeconds: Float64Array;
  stationCount: number;
  stationLane: IndexArray<LaneIndex>;
  stationPositionMm: Float64Array;
  stationStep: IndexArray<StepIndex>;
  stationPausesForBreaks: Uint8Array;
  /** Breaks stop the whole line (calendar breakMode 'wholeLine'), not only manual stations. */
  wholeLineBreaks: boolean;
  stationIds: string[];
  /** Carriers that fit on a station's lane from the lane start up to and including the station: how many a pooled step may send its way. */
  stationRoom: Int32Array;
  stepCount: number;
  stepKind: Int32Array;
  stepDispatch: Int32Array;
  stepRejectShare: Float64Array;
  stepReworkShare: Float64Array;
  stepReworkTarget: IndexArray<StepIndex>;
  /** Station indices of each step. */
  stepStations: IndexArray<StationIndex>[];
  routes: Routes;
};

function transferTimes(s: Scenario, t: Scenario['transfers'][number]): [number, number] {
  if (t.kind === 'curve') return [t.lengthMm / t.speedLimitMmPerS, 0];
  if (t.kind === 'lateral') {
    const shift = t.shiftDistanceMm / t.shiftSpeedMmPerS;
    return [t.handlingSeconds + shift, shift];
  }
  const deckOf = (laneId: string) => s.decks.find((d) => d.id === s.lanes.find((l) => l.id === laneId)?.deckId);
  const lift =
    Math.abs((deckOf(t.fromLaneId)?.elevationMm ?? 0) - (deckOf(t.toLaneId)?.elevationMm ?? 0)) / t.liftSpeedMmPerS;
  return [t.handlingSeconds + lift, lift];
}

export function compileLine(s: Scenario, carrierCount = s.carriers.count): CompiledLine {
  const laneIndex = new Map(s.lanes.map((l, i) => [l.id, i as LaneIndex]));
  const laneCount = s.lanes.length;
  const lengths = Float64Array.from(s.lanes, laneLengthMm);
  const connCount = s.links.length + s.transfers.length;
  const connKind = new Int32Array(connCount);
  const connFrom = indexArray<LaneIndex>(connCount, 0);
  const connTo = indexArray<LaneIndex>(connCount, 0);
  const connTransfer = new Int32Array(connCount).fill(-1);
  const connCarrySeconds = new Float64Array(connCount);
  const connReturnSeconds = new Float64Array(connCount);
  s.links.forEach((link, i) => {
    connKind[i] = CONN_LINK;
    connFrom[i] = laneIndex.get(link.fromLaneId) ?? NONE;
    connTo[i] = laneIndex.get(link.toLaneId) ?? NONE;
  });
  s.transfers.forEach((t, j) => {
    const i = s.links.length + j;
    connKind[i] = CONN_CODES[t.kind];
    connFrom[i] = laneIndex.get(t.fromLaneId) ?? NONE;
    connTo[i] = laneIndex.get(t.toLaneId) ?? NONE;
    connTransfer[i] = j;
    [connCarrySeconds[i], connReturnSeconds[i]] = transferTimes(s, t);
  });
  const stations = s.steps.flatMap((step, stepIndex) => step.stations.map((station) => ({ station, stepIndex })));
  let next = 0;
  const stepStations = s.steps.map((step) => asIndexArray<StationIndex>(Int32Array.from(step.stations, () => next++)));
  const stepIndex = new Map(s.steps.map((st, i) => [st.id, i]));
  const motion = createMotion(s);
  const pitchMm = s.conveyor.kind === 'belt' ? s.conveyor.pitchMm : s.carriers.lengthMm + s.carriers.minGapMm;
  const laneTraverseSeconds = lengths.map((len) => len / motion.cruiseMmPerS);
  return {
    scenario: s,
    carrierCount,
    carrierLengthMm: s.carriers.lengthMm,
    pitchMm,
    motion,
    locateSeconds: s.conveyor.kind === 'belt' ? s.conveyor.stopAndLocateSeconds : 0,
    laneCount,
    laneLengthMm: lengths,
    connCount,
    connKind,
    connFrom,
    connTo,
    connTransfer,
    connCarrySeconds,
    connReturnSeconds,
    stationCount: stations.length,
    stationLane: asIndexArray<LaneIndex>(Int32Array.from(stations, (x) => laneIndex.get(x.station.laneId) ?? -1)),
    stationPositionMm: Float64Array.from(stations, (x) => x.station.positionMm),
    stationStep: asIndexArray<StepIndex>(Int32Array.from(stations, (x) => x.stepIndex)),
    stationPausesForBreaks: Uint8Array.from(stations, (x) => (x.station.pausesForBreaks ? 1 : 0)),
    wholeLineBreaks: s.calendar.breakMode === 'wholeLine' && s.calendar.breaks.length > 0,
    stationIds: stations.map((x) => x.station.id),
    stationRoom: Int32Array.from(stations, (x) =>
      Math.max(1, Math.floor((x.station.positionMm - s.carriers.lengthMm) / pitchMm + 1e-9) + 1),
    ),
    stepCount: s.steps.length,
    stepKind: Int32Array.from(s.steps, (st) => STEP_CODES[st.kind]),
    stepDispatch: Int32Array.from(s.steps, (st) => DISPATCH_CODES[st.dispatch]),
    stepRejectShare: Float64Array.from(s.steps, (st) => (st.kind === 'inspect' ? st.rejectShare : 0)),
    stepReworkShare: Float64Array.from(s.steps, (st) => (st.kind === 'inspect' ? st.reworkShare : 0)),
    stepReworkTarget: asIndexArray<StepIndex>(
      Int32Array.from(s.steps, (st) =>
        st.kind === 'inspect' && st.reworkStepId !== undefined ? (stepIndex.get(st.reworkStepId) ?? -1) : -1,
      ),
    ),
    stepStations,
    routes: computeRoutes({ laneCount, laneTraverseSeconds, connFrom, connTo, connSeconds: connCarrySeconds }),
  };
}
