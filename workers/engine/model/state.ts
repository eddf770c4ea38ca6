// The mutable state of one replication, kept in flat typed arrays indexed by carrier, station, lane
// and connection number so the hot path touches no objects. Modules of the line model (lanes,
// stations, transfers) read and write it; the observer is told of every state change.
import type { Sampler } from '../random/sampler';
import type { Clock } from '../kernel/clock';
import type { EventQueue } from '../kernel/event-queue';
import { ST_STARVED, type Observer } from '../observe/observer';
import type { CompiledLine } from './compile';
import {
  indexArray,
  type CarrierIndex,
  type ConnIndex,
  type IndexArray,
  type LaneIndex,
  type StationIndex,
  type StepIndex,
} from './indexes';

// The state codes are the observer's vocabulary; re-exported so the model's modules find them here.
export {
  PH_EXIT,
  PH_MOVING,
  PH_QUEUED,
  PH_STATION,
  PH_TRANSFER,
  ST_BLOCKED,
  ST_BREAK,
  ST_DOWN,
  ST_PROCESSING,
  ST_STARVED,
  TR_CARRYING,
  TR_HOLDING,
  TR_IDLE,
  TR_RETURNING,
} from '../observe/observer';

/** Event kinds. */
export const EV_ARRIVE = 1;
export const EV_SEGMENT_END = 2;
export const EV_REPAIR_END = 3;
export const EV_CARRIED = 4;
export const EV_RETURNED = 5;
export const EV_LANE_WAKE = 6;
/** Events above this never change the line by themselves (clock-driven bookkeeping). */
export const EV_LAST_ACTIVE = 6;
export const EV_BREAK = 7;
export const EV_SAMPLE = 8;
export const EV_END = 9;

export type StationSamplers = {
  cycle: Sampler;
  failure: Sampler | null;
  repair: Sampler | null;
  inspect: Sampler | null;
};

/** The clock (now, queue, activePending) is the kernel's; activePending counts EV_ARRIVE … EV_LANE_WAKE. */
export type LineState = Clock & {
  line: CompiledLine;
  observer: Observer;
  breakActive: boolean;
  /** End of the whole-line stop in progress (see line-stop.ts), or -Infinity when the line runs. */
  stoppedUntil: number;
  // Carriers.
  cLane: IndexArray<LaneIndex>;
  cPos: Float64Array;
  cDest: Float64Array;
  cMoveStart: Float64Array;
  cMoveEnd: Float64Array;
  cProfile: Int8Array;
  cPhase: Int8Array;
  cAhead: IndexArray<CarrierIndex>;
  cBehind: IndexArray<CarrierIndex>;
  cStep: IndexArray<StepIndex>;
  cTarget: IndexArray<StationIndex>;
  cLoaded: Uint8Array;
  cAtStation: IndexArray<StationIndex>;
  cLoadTime: Float64Array;
  cLastLoad: Float64Array;
  cConn: IndexArray<ConnIndex>;
  cQueueConn: IndexArray<ConnIndex>;
  cWoken: Uint8Array;
  /** 1 while the carrier heads for a pooled step without having chosen its station (cTarget is then only a route hint). */
  cPending: Uint8Array;
  /** Platoon a carrier rides in or leads (-1: on its own); see platoons.ts. */
  cPlatoon: Int32Array;
  /** Order of arrival on its lane: consecutive from the lane's front to its rear. */
  cSeq: Int32Array;
  pLeader: IndexArray<CarrierIndex>;
  pRear: IndexArray<CarrierIndex>;
  pSize: Int32Array;
  /** The transfer whose queue the platoon's riders count in while they stand (-1: none). */
  pConn: IndexArray<ConnIndex>;
  pFree: Int32Array;
  pFreeTop: number;
  wakeRing: IndexArray<CarrierIndex>;
  wakeHead: number;
  wakeCount: number;
  // Lanes.
  laneFront: IndexArray<CarrierIndex>;
  laneRear: IndexArray<CarrierIndex>;
  laneCarriers: Int32Array;
  laneSeq: Int32Array;
  laneWakePending: Uint8Array;
  laneDirty: Uint8Array;
  /** Lanes to re-examine after the current event. */
  laneRing: LaneIndex[];
  /** Connections waiting to put a carrier on the lane, in request order. */
  laneRequests: ConnIndex[][];
  // Connections (links and transfers).
  tState: Int8Array;
  tCarrier: IndexArray<CarrierIndex>;
  tWaiting: IndexArray<CarrierIndex>;
  // Stations.
  sState: Int8Array;
  sCarrier: IndexArray<CarrierIndex>;
  sDone: Uint8Array;
  sDown: Uint8Array;
  sSegmentActive: Uint8Array;
  sSegmentStart: Float64Array;
  sSegmentLength: Float64Array;
  sWorkLeft: Float64Array;
  sToFailure: Float64Array;
  sGen: Int32Array;
  sAssigned: Int32Array;
  samplers: StationSamplers[];
  stepRoundRobin: Int32Array;
  /** Carriers standing at a decision point of a pooled step until one of its stations has room. */
  stepWaiting: CarrierIndex[][];
  wip: number;
};

export function createState(
  line: CompiledLine,
  queue: EventQueue,
  observer: Observer,
  samplers: StationSamplers[],
): LineState {
  const n = line.carrierCount;
  const s = line.stationCount;
  const c = line.connCount;
  return {
    line,
    queue,
    observer,
    now: 0,
    activePending: 0,
    breakActive: false,
    stoppedUntil: -Infinity,
    cLane: indexArray<LaneIndex>(n),
    cPos: new Float64Array(n),
    cDest: new Float64Array(n),
    cMoveStart: new Float64Array(n),
    cMoveEnd: new Float64Array(n),
    cProfile: new Int8Array(n),
    cPhase: new Int8Array(n).fill(-1),
    cAhead: indexArray<CarrierIndex>(n),
    cBehind: indexArray<CarrierIndex>(n),
    cStep: indexArray<StepIndex>(n, 0),
    cTarget: indexArray<StationIndex>(n),
    cLoaded: new Uint8Array(n),
    cAtStation: indexArray<StationIndex>(n),
    cLoadTime: new Float64Array(n),
    cLastLoad: new Float64Array(n).fill(-1),
    cConn: indexArray<ConnIndex>(n),
    cQueueConn: indexArray<ConnIndex>(n),
    cWoken: new Uint8Array(n),
    cPending: new Uint8Array(n),
    cPlatoon: new Int32Array(n).fill(-1),
    cSeq: new Int32Array(n),
    pLeader: indexArray<CarrierIndex>(n),
    pRear: indexArray<CarrierIndex>(n),
    pSize: new Int32Array(n),
    pConn: indexArray<ConnIndex>(n),
    pFree: Int32Array.from({ length: n }, (_, i) => n - 1 - i),
    pFreeTop: n,
    wakeRing: indexArray<CarrierIndex>(n, 0),
    wakeHead: 0,
    wakeCount: 0,
    laneFront: indexArray<CarrierIndex>(line.laneCount),
    laneRear: indexArray<CarrierIndex>(line.laneCount),
    laneCarriers: new Int32Array(line.laneCount),
    laneSeq: new Int32Array(line.laneCount),
    laneWakePending: new Uint8Array(line.laneCount),
    laneDirty: new Uint8Array(line.laneCount),
    laneRing: [],
    laneRequests: Array.from({ length: line.laneCount }, () => []),
    tState: new Int8Array(c),
    tCarrier: indexArray<CarrierIndex>(c),
    tWaiting: indexArray<CarrierIndex>(c),
    sState: new Int8Array(s).fill(ST_STARVED),
    sCarrier: indexArray<CarrierIndex>(s),
    sDone: new Uint8Array(s),
    sDown: new Uint8Array(s),
    sSegmentActive: new Uint8Array(s),
    sSegmentStart: new Float64Array(s),
    sSegmentLength: new Float64Array(s),
    sWorkLeft: new Float64Array(s),
    sToFailure: new Float64Array(s).fill(Infinity),
    sGen: new Int32Array(s),
    sAssigned: new Int32Array(s),
    samplers,
    stepRoundRobin: new Int32Array(line.stepCount),
    stepWaiting: Array.from({ length: line.stepCount }, () => []),
    wip: 0,
  };
}
