// The simulation clock and the event calendar of one replication, as the model sees them: the current
// time, the pending events, and how many of those can still change the model (gridlock detection
// counts them; see EventLoop). The model's state extends this; only the event loop moves the clock.
import type { EventQueue } from './event-queue';
import { PRIORITY } from './priorities';

export type Clock = {
  /** Simulated seconds; set by the event loop to each event's time as it is taken. */
  now: number;
  queue: EventQueue;
  /** Pending events that can change the model by themselves (kinds up to the loop's lastActiveKind). */
  activePending: number;
};

/** Schedules a line event (counted as one that can change the model) delay seconds from now. */
export function scheduleActive(clock: Clock, delay: number, kind: number, a: number, b = 0): void {
  clock.activePending++;
  clock.queue.push(clock.now + delay, PRIORITY.line, kind, a, b);
}

/** The same at an absolute time (not before now), for times computed from an earlier origin. */
export function scheduleActiveAt(clock: Clock, time: number, kind: number, a: number, b = 0): void {
  clock.activePending++;
  clock.queue.push(time, PRIORITY.line, kind, a, b);
}
