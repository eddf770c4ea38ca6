// What the line model reports as it runs. The model calls these on every change of state; the
// recorder turns them into time shares, counts and bounded-size series. Times are simulation seconds.
export type Observer = {
  stationState(station: number, state: number, t: number): void;
  /** count carriers went from one phase to another (from -1: placed on the line). */
  carrierPhases(from: number, to: number, count: number, t: number): void;
  transferState(conn: number, state: number, t: number): void;
  /** A carrier joined (+1) or left (-1) the queue in front of a transfer. */
  transferQueue(conn: number, delta: number, t: number): void;
  stationAssigned(station: number, assigned: number, t: number): void;
  laneCarriers(lane: number, count: number, t: number): void;
  wip(count: number, t: number): void;
  cycleSampled(station: number, seconds: number): void;
  operationDone(station: number, t: number): void;
  failure(station: number, t: number): void;
  transferMove(conn: number, t: number): void;
  /** A part was loaded; loopSeconds is the time since this carrier's previous load, or -1. */
  loaded(t: number, loopSeconds: number): void;
  /** A part was unloaded; leadSeconds is the time since its load completed. */
  output(t: number, leadSeconds: number): void;
  /** A part was rejected at an inspection; inLineSeconds is the time since its load completed. */
  scrapped(t: number, inLineSeconds: number): void;
  reworked(t: number): void;
};
