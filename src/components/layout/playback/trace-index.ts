// Looks a recorded trace up by time: where each carrier is and what state each station is in at any
// moment of the window. Carriers move linearly in time between the start and the end of each recorded
// move (the engine's motion profile accelerates and brakes; at playback scale the difference is a
// fraction of a carrier length), and across a transfer from take-over to hand-over.
import { TRACE_LOADED, type PlaybackTrace } from '../../../../shared/results/playback';

export interface TraceIndex {
  trace: PlaybackTrace;
  /** Per carrier, the indices of its changes in time order. */
  carrierRows: Int32Array[];
  /** Per station, the indices of its changes in time order. */
  stationRows: Int32Array[];
}

/** Where a carrier is: on a lane (`lane` ≥ 0, front at `posMm`) or `fraction` of the way across a connection. */
export interface CarrierPlace {
  lane: number;
  posMm: number;
  conn: number;
  fraction: number;
  loaded: boolean;
  /** True while a recorded move or transfer is under way at that moment. */
  moving: boolean;
}

function rowsBy(keys: Int32Array, count: number, groups: number): Int32Array[] {
  const sizes = new Int32Array(groups);
  for (let i = 0; i < count; i++) sizes[keys[i]]++;
  const rows = Array.from(sizes, (n) => new Int32Array(n));
  const filled = new Int32Array(groups);
  for (let i = 0; i < count; i++) rows[keys[i]][filled[keys[i]]++] = i;
  return rows;
}

export function indexTrace(trace: PlaybackTrace): TraceIndex {
  return {
    trace,
    carrierRows: rowsBy(trace.carriers.carrier, trace.carriers.count, trace.carrierCount),
    stationRows: rowsBy(trace.stations.station, trace.stations.count, trace.stationIds.length),
  };
}

/** The last row whose time is at or before t, or -1. */
function lastAtOrBefore(rows: Int32Array, times: Float64Array, t: number): number {
  let lo = 0;
  let hi = rows.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (times[rows[mid]] <= t) {
      found = rows[mid];
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/** Writes where carrier c is at time t into `out`; false when nothing is known of it yet. */
export function carrierAt(index: TraceIndex, c: number, t: number, out: CarrierPlace): boolean {
  const k = index.trace.carriers;
  const i = lastAtOrBefore(index.carrierRows[c], k.t, t);
  if (i < 0) return false;
  const span = k.endT[i] - k.t[i];
  const progress = span > 0 ? Math.min(Math.max((t - k.t[i]) / span, 0), 1) : 1;
  const where = k.where[i];
  out.loaded = (k.flags[i] & TRACE_LOADED) !== 0;
  out.moving = span > 0 && t < k.endT[i];
  if (where >= 0) {
    out.lane = where;
    out.conn = -1;
    out.posMm = k.posMm[i] + (k.destMm[i] - k.posMm[i]) * progress;
    out.fraction = 0;
  } else {
    out.lane = -1;
    out.conn = -1 - where;
    out.posMm = 0;
    out.fraction = progress;
  }
  return true;
}

/** The state index (order of STATION_STATES) of station s at time t, or -1 when unknown. */
export function stationStateAt(index: TraceIndex, s: number, t: number): number {
  const k = index.trace.stations;
  const i = lastAtOrBefore(index.stationRows[s], k.t, t);
  return i < 0 ? -1 : k.state[i];
}
