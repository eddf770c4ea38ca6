// Station states grouped by process step, so layouts with different stations line up step by step:
// each step's shares are the mean over its stations (parallel stations share the step's work).
import type { RunResult, StationState } from '../../../../shared/results/run-result';
import { STATION_STATES } from '../../../../shared/results/run-result';

export type StepShares = Record<StationState, number> & { stations: number };

export interface StepRow {
  stepId: string;
  name: string;
  /** Per compared run, in the order given; null when that run has no station for the step. */
  shares: (StepShares | null)[];
}

function stepShares(result: RunResult, stepId: string): StepShares | null {
  const stations = result.stations.filter((s) => s.stepId === stepId);
  if (stations.length === 0) return null;
  const shares = Object.fromEntries(
    STATION_STATES.map((state) => [state, stations.reduce((sum, s) => sum + s[state], 0) / stations.length]),
  ) as Record<StationState, number>;
  return { ...shares, stations: stations.length };
}

/** Steps in the order they first appear across the runs (the reference's order first). */
export function alignSteps(results: readonly RunResult[], stepNames: ReadonlyMap<string, string>): StepRow[] {
  const order: string[] = [];
  for (const result of results)
    for (const station of result.stations) if (!order.includes(station.stepId)) order.push(station.stepId);
  return order.map((stepId) => ({
    stepId,
    name: stepNames.get(stepId) ?? stepId,
    shares: results.map((r) => stepShares(r, stepId)),
  }));
}
