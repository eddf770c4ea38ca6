// Starting values for things the user adds or switches kind: a new lane, station or step, and the
// parameters of a distribution or transfer kind. Each starts valid, so adding never shows errors.
import type { Distribution, DistributionKind } from '../../../../../shared/scenario/distribution';
import type { Step, StepKind, Station } from '../../../../../shared/scenario/process';
import type { Lane, Transfer, TransferKind } from '../../../../../shared/scenario/track';
import type { Conveyor } from '../../../../../shared/scenario/carriers';

/** The first of prefix-1, prefix-2, … not in use. */
export function freeId(prefix: string, used: Iterable<string | undefined>): string {
  const taken = new Set(used);
  for (let n = 1; ; n += 1) if (!taken.has(`${prefix}-${n}`)) return `${prefix}-${n}`;
}

/** Keeps the current mean where the new kind allows it, so switching kind keeps the time in the right range. */
export function distributionOfKind(kind: DistributionKind, mean: number): Distribution {
  const m = Number.isFinite(mean) && mean > 0 ? mean : 1;
  const round = (v: number) => Math.round(v * 1000) / 1000;
  switch (kind) {
    case 'fixed':
      return { kind, value: round(m) };
    case 'uniform':
      return { kind, min: round(m * 0.8), max: round(m * 1.2) };
    case 'triangular':
      return { kind, min: round(m * 0.8), mode: round(m), max: round(m * 1.2) };
    case 'normal':
      return { kind, mean: round(m), sd: round(m * 0.1), min: 0 };
    case 'lognormal':
      return { kind, mean: round(m), cv: 0.2 };
    case 'exponential':
      return { kind, mean: round(m) };
    case 'erlang':
      return { kind, mean: round(m), k: 3 };
    case 'gamma':
      return { kind, mean: round(m), cv: 0.3 };
    case 'empirical':
      return { kind, samples: [round(m * 0.9), round(m), round(m * 1.1)] };
  }
}

export function transferOfKind(
  kind: TransferKind,
  base: Pick<Transfer, 'id' | 'name' | 'fromLaneId' | 'toLaneId'>,
): Transfer {
  switch (kind) {
    case 'elevator':
      return { ...base, kind, handlingSeconds: 1.5, liftSpeedMmPerS: 500 };
    case 'lateral':
      return { ...base, kind, handlingSeconds: 1, shiftDistanceMm: 400, shiftSpeedMmPerS: 500 };
    case 'curve':
      return { ...base, kind, lengthMm: 600, speedLimitMmPerS: 800 };
  }
}

export function stepOfKind(kind: StepKind, step: Pick<Step, 'id' | 'name' | 'stations' | 'dispatch'>): Step {
  const base = { id: step.id, name: step.name, stations: step.stations, dispatch: step.dispatch };
  return kind === 'inspect' ? { ...base, kind, rejectShare: 0, reworkShare: 0 } : { ...base, kind };
}

export function conveyorOfKind(kind: Conveyor['kind'], carrierLengthMm: number): Conveyor {
  return kind === 'belt'
    ? { kind, speedMmPerS: 300, stopAndLocateSeconds: 1.5, pitchMm: Math.max(carrierLengthMm, 1) + 100 }
    : { kind };
}

export function newLane(id: string, deckId: string, moduleLengthMm: number, start: { xMm: number; yMm: number }): Lane {
  return { id, name: `Lane ${id}`, deckId, modules: [{ lengthMm: moduleLengthMm, count: 4 }], start, heading: 'east' };
}

export function newStation(id: string, laneId: string, positionMm: number): Station {
  return {
    id,
    name: `Station ${id}`,
    laneId,
    positionMm,
    cycleTimeSeconds: { kind: 'fixed', value: 5 },
    operation: 'automatic',
    pausesForBreaks: false,
  };
}
