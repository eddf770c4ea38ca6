// The line model as the event loop drives it: sets up the state and the random draws of one
// replication, handles each event, and after every event settles the carriers and lanes it woke
// (moves started, stations entered, lane starts handed out) before the next, so handlers never
// re-enter one another. It reports to an Observer and knows no recorder; it stops with a clear
// reason on gridlock or on a stall of simulated time.
import type { EventModel } from '../kernel/event-loop';
import type { EventQueue } from '../kernel/event-queue';
import { PRIORITY } from '../kernel/priorities';
import { SimulationStoppedError } from '../kernel/stop';
import type { Observer } from '../observe/observer';
import { createSampler } from '../random/sampler';
import type { StreamFactory } from '../random/streams';
import { inBreak, nextBreakEdge } from './breaks';
import type { CompiledLine } from './compile';
import { decidePending } from './dispatch';
import { gridlockReport, stallMessage } from './gridlock';
import type { CarrierIndex, ConnIndex, LaneIndex, StationIndex } from './indexes';
import { checkInvariants } from './invariants';
import { advance, completeMove, nextWoken, positionAt, wake } from './lanes';
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

export type LineModelConfig = {
  /** Simulation time at which the replication starts; the clock of every other time here. */
  originSeconds: number;
  endSeconds: number;
  /** When the first carrier-position sample is taken, and how often after it (see Observer.laneOccupancy). */
  firstSampleSeconds: number;
  sampleSeconds: number;
  /** Check overlap and conservation after every event (tests). */
  checkInvariants: boolean;
};

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

export class LineModel implements EventModel {
  readonly state: LineState;
  private readonly breaksApply: boolean;
  private ended = false;

  constructor(
    readonly line: CompiledLine,
    streams: StreamFactory,
    queue: EventQueue,
    observer: Observer,
    private readonly config: LineModelConfig,
  ) {
    const m = createState(line, queue, observer, makeSamplers(line, streams));
    this.state = m;
    const origin = config.originSeconds;
    m.now = origin;
    const calendar = line.scenario.calendar;
    this.breaksApply =
      calendar.breaks.length > 0 && (line.wholeLineBreaks || line.stationPausesForBreaks.some((p) => p === 1));
    startFailureClocks(m);
    for (let s = 0; s < line.stationCount; s++) m.observer.stationState(s, m.sState[s], origin);
    placeCarriers(m);
    m.queue.push(config.firstSampleSeconds, PRIORITY.sample, EV_SAMPLE, 0, 0);
    m.queue.push(config.endSeconds, PRIORITY.end, EV_END, 0, 0);
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

  private scheduleBreak(after: number): void {
    const edge = nextBreakEdge(this.line.scenario.calendar, after);
    if (edge && edge.time < this.config.endSeconds)
      this.state.queue.push(edge.time, PRIORITY.calendar, EV_BREAK, edge.starting ? 1 : 0, 0);
  }

  private sample(t: number): void {
    const m = this.state;
    for (let i = 0; i < this.line.carrierCount; i++) {
      const c = i as CarrierIndex;
      const lane = m.cLane[c];
      if (lane < 0) continue;
      const head = positionAt(m, c, positionClock(m, t));
      m.observer.laneOccupancy(lane, head - this.line.carrierLengthMm, head, t);
    }
    const next = t + this.config.sampleSeconds;
    if (next < this.config.endSeconds) m.queue.push(next, PRIORITY.sample, EV_SAMPLE, 0, 0);
  }

  /** Event payloads are plain numbers; each kind says what its first one indexes. */
  handle(kind: number, a: number, b: number): void {
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

  afterEvent(): void {
    const m = this.state;
    settle(m);
    if (this.config.checkInvariants) checkInvariants(m);
    this.checkGridlock();
  }

  finish(): void {
    this.ended = true;
  }

  stalled(events: number, t: number): SimulationStoppedError {
    return new SimulationStoppedError('gridlock', stallMessage(this.line, events, t), gridlockReport(this.state));
  }

  /** With nothing pending that can change the line and no break to end, nothing ever will. */
  checkGridlock(): void {
    const m = this.state;
    if (this.ended || m.activePending > 0 || m.breakActive) return;
    throw new SimulationStoppedError(
      'gridlock',
      `gridlock at t=${m.now.toFixed(1)} s: no carrier can move and no station is working`,
      gridlockReport(m),
    );
  }
}
