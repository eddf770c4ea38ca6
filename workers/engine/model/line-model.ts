// One replication of a line: sets up state, random draws and the recorder, then runs the event loop
// in slices so the caller can yield to its host between them. After every event the carriers and
// lanes it woke are settled (moves started, stations entered, lane starts handed out) before the
// next event, so handlers never re-enter one another. Stops with a clear reason on gridlock,
// on a stall of simulated time, or when the event budget is spent.
import { EventQueue } from '../kernel/event-queue';
import { SimulationStoppedError } from '../kernel/stop';
import { Recorder } from '../observe/recorder';
import { createSampler } from '../random/sampler';
import type { StreamFactory } from '../random/streams';
import { inBreak, nextBreakEdge } from './breaks';
import type { CompiledLine } from './compile';
import { decidePending } from './dispatch';
import { gridlockReport, stallMessage } from './gridlock';
import type { CarrierIndex, ConnIndex, LaneIndex, StationIndex } from './indexes';
import { checkInvariants } from './invariants';
import { advance, completeMove, nextWoken, positionAt, wake } from './lanes';
import { PROFILE_EMPTY, PROFILE_LOADED } from './motion';
import { positionClock, restartLine, stopLine } from './line-stop';
import { placeCarriers } from './placement';
import { leaderOf, leave } from './platoons';
import {
  createState,
  EV_ARRIVE,
  EV_BREAK,
  EV_CARRIED,
  EV_END,
  EV_LANE_WAKE,
  EV_LAST_ACTIVE,
  EV_REPAIR_END,
  EV_RETURNED,
  EV_SAMPLE,
  EV_SEGMENT_END,
  PH_QUEUED,
  type LineState,
  type StationSamplers,
} from './state';
import { arriveAtStation, onRepairEnd, onSegmentEnd, releaseStation, setBreak, startFailureClocks } from './stations';
import { onCarried, onReturned, requestExit, serveLane } from './transfers';

export type ReplicationConfig = {
  warmupSeconds: number;
  endSeconds: number;
  timeBins: number;
  positionBins: number;
  /** Events allowed in this replication before it stops. */
  eventBudget: number;
  /** Check overlap and conservation after every event (tests). */
  checkInvariants?: boolean;
  /**
   * Simulation time at which the replication starts (default 0); warmupSeconds and endSeconds are on
   * the same clock. Tests start late to show that results do not depend on the clock's magnitude.
   */
  originSeconds?: number;
};

/** Events in a row without simulated time passing before the run counts as stuck. */
const STALL_LIMIT = 1_000_000;

function makeSamplers(line: CompiledLine, streams: StreamFactory): StationSamplers[] {
  const s = line.scenario;
  const inspect = s.steps.map((step) => (step.kind === 'inspect' ? streams(`step:${step.id}:inspect`) : null));
  return s.steps.flatMap((step, i) =>
    step.stations.map((st) => ({
      cycle: createSampler(st.cycleTimeSeconds, streams(`station:${st.id}:cycle`)),
      failure: st.failures
        ? createSampler(st.failures.timeBetweenFailuresSeconds, streams(`station:${st.id}:failure`))
        : null,
      repair: st.failures ? createSampler(st.failures.timeToRepairSeconds, streams(`station:${st.id}:repair`)) : null,
      inspect: inspect[i],
    })),
  );
}

/** Settles everything the last event woke: lane starts first, then carriers that may move. */
function settle(m: LineState): void {
  for (;;) {
    if (m.laneRing.length > 0) {
      const lane = m.laneRing.shift() as LaneIndex;
      m.laneDirty[lane] = 0;
      serveLane(m, lane);
      continue;
    }
    const c = nextWoken(m);
    if (c < 0) return;
    // Riders move only with their leader.
    if (m.cPhase[c] !== PH_QUEUED || leaderOf(m, c) !== c) continue;
    const outcome = advance(m, c);
    if (outcome === 'moved') {
      if (m.cAtStation[c] >= 0) releaseStation(m, c);
    } else if (outcome === 'atStop') {
      leave(m, c);
      if (m.cAtStation[c] >= 0) releaseStation(m, c);
      if (m.cPending[c] && !decidePending(m, c)) continue;
      const target = m.cTarget[c];
      const onLane = m.line.stationLane[target] === m.cLane[c];
      const offset = m.line.stationPositionMm[target] - m.cPos[c];
      if (onLane && Math.abs(offset) < 1e-6) arriveAtStation(m, c, target);
      // Chose a station further along this lane: run on to it.
      else if (onLane && offset > 0 && !m.cPending[c]) wake(m, c);
      else requestExit(m, c);
    }
  }
}

export class Replication {
  readonly state: LineState;
  readonly recorder: Recorder;
  events = 0;
  done = false;
  private stalled = 0;
  private readonly breaksApply: boolean;

  constructor(
    readonly line: CompiledLine,
    streams: StreamFactory,
    private readonly config: ReplicationConfig,
  ) {
    // The bottleneck analysis bridges the in-feed gap of a queued carrier, with half again for margin.
    const inFeed = Math.max(
      line.motion.moveSeconds(line.pitchMm, PROFILE_LOADED),
      line.motion.moveSeconds(line.pitchMm, PROFILE_EMPTY),
    );
    this.recorder = new Recorder(
      line,
      config.warmupSeconds,
      config.endSeconds,
      config.timeBins,
      config.positionBins,
      1.5 * inFeed,
    );
    const m = createState(line, new EventQueue(), this.recorder, makeSamplers(line, streams));
    this.state = m;
    const origin = config.originSeconds ?? 0;
    m.now = origin;
    const calendar = line.scenario.calendar;
    this.breaksApply =
      calendar.breaks.length > 0 && (line.wholeLineBreaks || line.stationPausesForBreaks.some((p) => p === 1));
    startFailureClocks(m);
    for (let s = 0; s < line.stationCount; s++) m.observer.stationState(s, m.sState[s], origin);
    placeCarriers(m);
    m.queue.push(config.warmupSeconds + this.sampleInterval() / 2, 2, EV_SAMPLE, 0, 0);
    m.queue.push(config.endSeconds, 3, EV_END, 0, 0);
    // The first moves are planned before a break in progress at the start can stop them.
    settle(m);
    if (this.breaksApply) {
      if (inBreak(calendar, origin)) this.setBreak(true);
      this.scheduleBreak(origin);
    }
  }

  /** Starts or ends a break; in whole-line mode the line stops until the break's end. */
  private setBreak(starting: boolean): void {
    const m = this.state;
    if (this.line.wholeLineBreaks) {
      if (starting) stopLine(m, nextBreakEdge(this.line.scenario.calendar, m.now)?.time ?? m.now);
      else restartLine(m);
    }
    setBreak(m, starting);
  }

  private sampleInterval(): number {
    return this.recorder.window.binSeconds / this.recorder.samplesPerBin;
  }

  private scheduleBreak(after: number): void {
    const edge = nextBreakEdge(this.line.scenario.calendar, after);
    if (edge && edge.time < this.config.endSeconds)
      this.state.queue.push(edge.time, 0, EV_BREAK, edge.starting ? 1 : 0, 0);
  }

  private sample(t: number): void {
    const m = this.state;
    for (let i = 0; i < this.line.carrierCount; i++) {
      const c = i as CarrierIndex;
      const lane = m.cLane[c];
      if (lane < 0) continue;
      const head = positionAt(m, c, positionClock(m, t));
      this.recorder.sampleCarrier(lane, head - this.line.carrierLengthMm, head, t);
    }
    const next = t + this.sampleInterval();
    if (next < this.config.endSeconds) m.queue.push(next, 2, EV_SAMPLE, 0, 0);
  }

  /** Event payloads are plain numbers; each kind says what its first one indexes. */
  private handle(kind: number, a: number, b: number): void {
    const m = this.state;
    switch (kind) {
      case EV_ARRIVE:
        completeMove(m, a as CarrierIndex);
        wake(m, a as CarrierIndex);
        break;
      case EV_SEGMENT_END:
        onSegmentEnd(m, a as StationIndex, b);
        break;
      case EV_REPAIR_END:
        onRepairEnd(m, a as StationIndex);
        break;
      case EV_CARRIED:
        onCarried(m, a as ConnIndex);
        break;
      case EV_RETURNED:
        onReturned(m, a as ConnIndex);
        break;
      case EV_LANE_WAKE:
        m.laneWakePending[a] = 0;
        serveLane(m, a as LaneIndex);
        break;
      case EV_BREAK:
        this.setBreak(a === 1);
        this.scheduleBreak(m.now);
        break;
      case EV_SAMPLE:
        this.sample(m.now);
        break;
    }
  }

  /** With nothing pending that can change the line and no break to end, nothing ever will. */
  private checkGridlock(): void {
    const m = this.state;
    if (this.done || m.activePending > 0 || m.breakActive) return;
    throw new SimulationStoppedError(
      'gridlock',
      `gridlock at t=${m.now.toFixed(1)} s: no carrier can move and no station is working`,
      gridlockReport(m),
    );
  }

  /**
   * Runs events until the replication ends (returns true) or shouldYield, asked every 1024 events,
   * says to hand control back (returns false; call again to continue).
   */
  run(shouldYield: () => boolean): boolean {
    const m = this.state;
    const q = m.queue;
    this.checkGridlock();
    while (!this.done && q.pop()) {
      const t = q.popTime;
      const kind = q.popKind;
      if (t > m.now) {
        m.now = t;
        this.stalled = 0;
      } else if (++this.stalled > STALL_LIMIT) {
        throw new SimulationStoppedError('gridlock', stallMessage(this.line, STALL_LIMIT, t), gridlockReport(m));
      }
      if (kind <= EV_LAST_ACTIVE) m.activePending--;
      this.events++;
      if (kind === EV_END) {
        this.recorder.finish();
        this.done = true;
        return true;
      }
      this.handle(kind, q.popA, q.popB);
      settle(m);
      if (this.config.checkInvariants) checkInvariants(m);
      this.checkGridlock();
      if (this.events > this.config.eventBudget) {
        throw new SimulationStoppedError(
          'eventBudget',
          `stopped after ${this.config.eventBudget} events, the budget for one replication, at t=${m.now.toFixed(1)} s; shorten the run or raise the budget`,
        );
      }
      if ((this.events & 1023) === 0 && shouldYield()) return false;
    }
    return this.done;
  }
}
