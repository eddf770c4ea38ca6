// Records what a playback needs, alongside the recorder and without changing it: every carrier
// change (lane, position, move end, loaded) and every station state change inside a chosen window of
// simulated time, in growable typed arrays with a hard cap. Before the window opens it keeps only the
// latest change per carrier and station, and writes those out when the first change inside the window
// arrives, so the player knows where everything was when the window began.
import { PLAYBACK_LIMITS, TRACE_LOADED, type PlaybackTrace } from '../../../shared/results/playback';
import type { CompiledLine } from '../model/compile';
import type { LineState } from '../model/state';
import { leaderOf, offsetMm } from '../model/platoons';
import { PH_MOVING, PH_TRANSFER, type Observer } from './observer';
import type { CarrierIndex } from '../model/indexes';

export class TraceLimitError extends Error {
  override readonly name = 'TraceLimitError';
}

const CONN_KINDS = ['link', 'elevator', 'lateral', 'curve'] as const;

type CarrierColumns = PlaybackTrace['carriers'];
type StationColumns = PlaybackTrace['stations'];

function carrierColumns(size: number): CarrierColumns {
  return {
    count: 0,
    t: new Float64Array(size),
    carrier: new Int32Array(size),
    where: new Int32Array(size),
    posMm: new Float32Array(size),
    destMm: new Float32Array(size),
    endT: new Float64Array(size),
    flags: new Uint8Array(size),
  };
}

function stationColumns(size: number): StationColumns {
  return { count: 0, t: new Float64Array(size), station: new Int32Array(size), state: new Uint8Array(size) };
}

/** Copies every typed array of `from` into a larger block of the same shape. */
function grow<T extends { count: number }>(from: T, make: (size: number) => T, size: number): T {
  const to = make(size);
  for (const key of Object.keys(from) as (keyof T)[]) {
    const column = from[key];
    if (ArrayBuffer.isView(column)) (to[key] as unknown as { set(a: unknown): void }).set(column);
  }
  to.count = from.count;
  return to;
}

/** Trims a block to its filled length, so only recorded changes cross to the page. */
function trim<T extends { count: number }>(from: T): T {
  const out = { ...from };
  for (const key of Object.keys(from) as (keyof T)[]) {
    const column = from[key];
    if (ArrayBuffer.isView(column)) out[key] = (column as unknown as Float64Array).slice(0, from.count) as T[keyof T];
  }
  return out;
}

export class TraceRecorder {
  private carriers = carrierColumns(1024);
  private stations = stationColumns(256);
  private opened = false;
  private m: LineState | null = null;
  // The latest change per carrier and station before the window opens.
  private readonly lastT: Float64Array;
  private readonly lastWhere: Int32Array;
  private readonly lastPos: Float32Array;
  private readonly lastDest: Float32Array;
  private readonly lastEnd: Float64Array;
  private readonly lastFlags: Uint8Array;
  private readonly lastState: Uint8Array;
  private readonly lastStateT: Float64Array;

  constructor(
    private readonly line: CompiledLine,
    readonly startSeconds: number,
    readonly endSeconds: number,
    private readonly limits: { carrierChangesMax: number; stationChangesMax: number } = PLAYBACK_LIMITS,
  ) {
    const n = line.carrierCount;
    this.lastT = new Float64Array(n).fill(-1);
    this.lastWhere = new Int32Array(n).fill(-1);
    this.lastPos = new Float32Array(n);
    this.lastDest = new Float32Array(n);
    this.lastEnd = new Float64Array(n);
    this.lastFlags = new Uint8Array(n);
    this.lastState = new Uint8Array(line.stationCount);
    this.lastStateT = new Float64Array(line.stationCount);
  }

  /** Starts watching a replication whose construction has placed the carriers and set the stations. */
  attach(m: LineState): void {
    this.m = m;
    for (let s = 0; s < this.line.stationCount; s++) this.station(s, m.sState[s], 0);
    this.scan(0);
  }

  /** Wraps an observer so every call reaches it first and the trace second. */
  observe(base: Observer): Observer {
    // Built from whatever methods the base has, so the trace keeps working as the observer grows.
    const tee: Record<string, unknown> = {};
    for (
      let proto: object | null = base;
      proto && proto !== Object.prototype;
      proto = Object.getPrototypeOf(proto) as object | null
    ) {
      for (const key of Object.getOwnPropertyNames(proto)) {
        const value = (base as unknown as Record<string, unknown>)[key];
        if (key !== 'constructor' && typeof value === 'function' && !(key in tee))
          tee[key] = (value as (...a: unknown[]) => unknown).bind(base);
      }
    }
    const observer = tee as unknown as Observer;
    // Phase changes come counted, not per carrier (a platoon moves as one), so each one is followed
    // by a look at every carrier: cheap for the replay's tens of carriers, and exact.
    observer.carrierPhases = (from, to, count, t) => {
      base.carrierPhases(from, to, count, t);
      this.scan(t);
    };
    observer.stationState = (s, state, t) => {
      base.stationState(s, state, t);
      this.station(s, state, t);
    };
    return observer;
  }

  get done(): boolean {
    return (this.m?.now ?? 0) > this.endSeconds;
  }

  private open(): void {
    this.opened = true;
    for (let s = 0; s < this.line.stationCount; s++) this.pushStation(s, this.lastState[s], this.lastStateT[s]);
    for (let c = 0; c < this.line.carrierCount; c++) {
      if (this.lastT[c] >= 0)
        this.pushCarrier(
          c,
          this.lastT[c],
          this.lastWhere[c],
          this.lastPos[c],
          this.lastDest[c],
          this.lastEnd[c],
          this.lastFlags[c],
        );
    }
  }

  /** Records every carrier whose place, move or load differs from what was last recorded for it. */
  private scan(t: number): void {
    const m = this.m;
    if (!m || t > this.endSeconds) return;
    for (let i = 0; i < this.line.carrierCount; i++) {
      const c = i as CarrierIndex;
      const leader = leaderOf(m, c);
      const offset = offsetMm(m, c);
      const phase = m.cPhase[leader];
      const inTransfer = phase === PH_TRANSFER;
      const where = inTransfer ? -1 - m.cConn[c] : m.cLane[c];
      const pos = inTransfer ? 0 : m.cPos[leader] - offset;
      const moving = phase === PH_MOVING;
      const dest = inTransfer ? 1 : moving ? m.cDest[leader] - offset : pos;
      const flags = m.cLoaded[c] ? TRACE_LOADED : 0;
      const same =
        this.lastT[c] >= 0 &&
        this.lastWhere[c] === where &&
        this.lastPos[c] === Math.fround(pos) &&
        this.lastDest[c] === Math.fround(dest) &&
        this.lastFlags[c] === flags;
      if (same && (moving || inTransfer) === this.lastEnd[c] > this.lastT[c]) continue;
      const end = inTransfer ? t + this.line.connCarrySeconds[m.cConn[c]] : moving ? m.cMoveEnd[leader] : t;
      // The window opens with where everything was just before it, then this change.
      if (t >= this.startSeconds && !this.opened) this.open();
      this.lastT[c] = t;
      this.lastWhere[c] = where;
      this.lastPos[c] = pos;
      this.lastDest[c] = dest;
      this.lastEnd[c] = end;
      this.lastFlags[c] = flags;
      if (t >= this.startSeconds) this.pushCarrier(c, t, where, pos, dest, end, flags);
    }
  }

  private station(s: number, state: number, t: number): void {
    if (t > this.endSeconds) return;
    if (t < this.startSeconds) {
      this.lastState[s] = state;
      this.lastStateT[s] = t;
      return;
    }
    if (!this.opened) this.open();
    this.pushStation(s, state, t);
  }

  private pushCarrier(
    c: number,
    t: number,
    where: number,
    pos: number,
    dest: number,
    end: number,
    flags: number,
  ): void {
    let k = this.carriers;
    if (k.count === k.t.length) {
      if (k.count >= this.limits.carrierChangesMax) throw this.overflow('carrier', this.limits.carrierChangesMax, t);
      k = this.carriers = grow(k, carrierColumns, Math.min(k.count * 2, this.limits.carrierChangesMax));
    }
    const i = k.count++;
    k.t[i] = t;
    k.carrier[i] = c;
    k.where[i] = where;
    k.posMm[i] = pos;
    k.destMm[i] = dest;
    k.endT[i] = end;
    k.flags[i] = flags;
  }

  private pushStation(s: number, state: number, t: number): void {
    let k = this.stations;
    if (k.count === k.t.length) {
      if (k.count >= this.limits.stationChangesMax)
        throw this.overflow('station state', this.limits.stationChangesMax, t);
      k = this.stations = grow(k, stationColumns, Math.min(k.count * 2, this.limits.stationChangesMax));
    }
    const i = k.count++;
    k.t[i] = t;
    k.station[i] = s;
    k.state[i] = state;
  }

  private overflow(what: string, cap: number, t: number): TraceLimitError {
    const minutes = ((t - this.startSeconds) / 60).toFixed(1);
    return new TraceLimitError(
      `the playback window holds more than ${cap.toLocaleString('en-GB')} ${what} changes (the limit that keeps it in memory), reached ${minutes} min into the window; choose a shorter window`,
    );
  }

  /** The recorded window, trimmed to what was filled. */
  finish(replication: number): PlaybackTrace {
    if (!this.opened) this.open();
    const line = this.line;
    return {
      startSeconds: this.startSeconds,
      endSeconds: this.endSeconds,
      replication,
      carrierCount: line.carrierCount,
      carrierLengthMm: line.carrierLengthMm,
      laneIds: line.scenario.lanes.map((l) => l.id),
      stationIds: [...line.stationIds],
      connFrom: line.connFrom.slice(),
      connTo: line.connTo.slice(),
      connKind: Array.from(line.connKind, (k) => CONN_KINDS[k]),
      carriers: trim(this.carriers),
      stations: trim(this.stations),
    };
  }
}
