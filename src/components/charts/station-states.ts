// Station state data shared by the timeline and the bars: checks and per-station summaries.
import { STATION_STATES, type StationState } from './palette';
import { checkShares, firstProblem, SHARE_TOLERANCE, type Problem } from './validate';

export interface StationRef {
  id: string;
  name: string;
}

export function statesProblem(states: readonly StationState[], path = 'states'): Problem {
  if (states.length === 0) return `${path} must name at least one state`;
  for (const [i, state] of states.entries()) {
    if (!STATION_STATES.includes(state)) return `${path}[${i}] is "${state}", not one of ${STATION_STATES.join(', ')}`;
    if (states.indexOf(state) !== i) return `${path}[${i}] repeats "${state}"`;
  }
  return null;
}

/** Shares of one group (a station, or a station in one time bin) must not add up to more than 1. */
export function groupSumProblem(
  shares: readonly number[],
  groupSize: number,
  describe: (group: number) => string,
): Problem {
  return firstProblem(
    () => checkShares(shares, 'shares'),
    () => {
      for (let g = 0; g * groupSize < shares.length; g++) {
        let sum = 0;
        for (let s = 0; s < groupSize; s++) sum += shares[g * groupSize + s];
        if (sum > 1 + SHARE_TOLERANCE * groupSize) return `shares for ${describe(g)} add up to ${sum}, more than 1`;
      }
      return null;
    },
  );
}

/** The state holding the largest share; null when nothing was recorded (all shares zero). */
export function dominantState(
  shares: readonly number[],
  offset: number,
  states: readonly StationState[],
): StationState | null {
  let best: StationState | null = null;
  let bestShare = 0;
  states.forEach((state, s) => {
    if (shares[offset + s] > bestShare) [best, bestShare] = [state, shares[offset + s]];
  });
  return best;
}
