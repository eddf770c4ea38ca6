// The event loop of one replication: takes events in order, moves the clock, lets the model handle
// each one and settle what it woke, and runs in slices so the caller can yield to its host between
// them. It knows nothing of lines or carriers: the model tells it which event kinds can change the
// model (for gridlock detection), which kind ends the run, and how to describe a stall.
import type { Clock } from './clock';
import { SimulationStoppedError } from './stop';

export type EventModel = {
  /** Handles one event; the clock already shows its time. */
  handle(kind: number, a: number, b: number): void;
  /** Runs after every event (settling, self-checks); may throw to stop the run. */
  afterEvent(): void;
  /** The error to stop with when simulated time has not passed for STALL_LIMIT events in a row. */
  stalled(events: number, t: number): SimulationStoppedError;
  /** Called once when the end event is taken. */
  finish(): void;
};

export type LoopConfig = {
  /** Event kinds up to this one can change the model; the clock's activePending counts them. */
  lastActiveKind: number;
  endKind: number;
  /** Events allowed in this replication before it stops. */
  eventBudget: number;
};

/** Events in a row without simulated time passing before the run counts as stuck. */
export const STALL_LIMIT = 1_000_000;

export class EventLoop {
  events = 0;
  done = false;
  private stalledEvents = 0;

  constructor(
    private readonly clock: Clock,
    private readonly model: EventModel,
    private readonly config: LoopConfig,
  ) {}

  /**
   * Runs events until the replication ends (returns true) or shouldYield, asked every 1024 events,
   * says to hand control back (returns false; call again to continue).
   */
  run(shouldYield: () => boolean): boolean {
    const clock = this.clock;
    const q = clock.queue;
    const model = this.model;
    const { lastActiveKind, endKind, eventBudget } = this.config;
    while (!this.done && q.pop()) {
      const t = q.popTime;
      const kind = q.popKind;
      if (t > clock.now) {
        clock.now = t;
        this.stalledEvents = 0;
      } else if (++this.stalledEvents > STALL_LIMIT) throw model.stalled(STALL_LIMIT, t);
      if (kind <= lastActiveKind) clock.activePending--;
      this.events++;
      if (kind === endKind) {
        model.finish();
        this.done = true;
        return true;
      }
      model.handle(kind, q.popA, q.popB);
      model.afterEvent();
      if (this.events > eventBudget) {
        throw new SimulationStoppedError(
          'eventBudget',
          `stopped after ${eventBudget} events, the budget for one replication, at t=${clock.now.toFixed(1)} s; shorten the run or raise the budget`,
        );
      }
      if ((this.events & 1023) === 0 && shouldYield()) return false;
    }
    return this.done;
  }
}
