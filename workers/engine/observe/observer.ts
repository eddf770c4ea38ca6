// What the line model reports as it runs. The model calls these on every change of state; the
// recorder turns them into time shares, counts and bounded-size series. Times are simulation seconds.
// The state codes below are the vocabulary of these reports: the model keeps its state in them and
// any observer reads them, so neither side needs the other's modules.

/** Carrier phases. */
export const PH_MOVING = 0;
/** Stopped, wants to move on: waiting for track ahead. */
export const PH_QUEUED = 1;
/** At the station it was sent to, being served (or waiting for the station to come back up). */
export const PH_STATION = 2;
/** At a lane end, waiting for its link or transfer. */
export const PH_EXIT = 3;
export const PH_TRANSFER = 4;

/** Station states, in the order of STATION_STATES in the run result. */
export const ST_PROCESSING = 0;
export const ST_STARVED = 1;
export const ST_BLOCKED = 2;
export const ST_DOWN = 3;
export const ST_BREAK = 4;

/** Transfer states: waiting for a carrier, carrying one, holding one the next lane has no room for
 * (blocked), travelling back empty. */
export const TR_IDLE = 0;
export const TR_CARRYING = 1;
export const TR_HOLDING = 2;
export const TR_RETURNING = 3;
export const TRANSFER_STATE_COUNT = 4;

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
  /** A snapshot sample: a carrier covers [tailMm, headMm] of a lane at t (for the space-time heatmap). */
  laneOccupancy(lane: number, tailMm: number, headMm: number, t: number): void;
};
