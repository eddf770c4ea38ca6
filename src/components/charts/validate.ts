// Input checks for chart props. Each returns the first problem as a sentence naming the field path,
// or null; charts show it instead of drawing something wrong.

export type Problem = string | null;

export function firstProblem(...checks: ReadonlyArray<() => Problem>): Problem {
  for (const check of checks) {
    const problem = check();
    if (problem) return problem;
  }
  return null;
}

export function checkPositive(value: number, path: string): Problem {
  return Number.isFinite(value) && value > 0 ? null : `${path} must be a number above zero, got ${value}`;
}

export function checkFinite(value: number, path: string): Problem {
  return Number.isFinite(value) ? null : `${path} must be a finite number, got ${value}`;
}

export function checkNumbers(values: readonly number[], path: string, range?: { min?: number; max?: number }): Problem {
  for (let i = 0; i < values.length; i++) {
    const value = values[i];
    if (typeof value !== 'number' || !Number.isFinite(value))
      return `${path}[${i}] must be a finite number, got ${value}`;
    if (range?.min !== undefined && value < range.min)
      return `${path}[${i}] is ${value}, below the lowest allowed value ${range.min}`;
    if (range?.max !== undefined && value > range.max)
      return `${path}[${i}] is ${value}, above the highest allowed value ${range.max}`;
  }
  return null;
}

/** Shares may overshoot 1 by rounding in the engine's time-weighted sums; more than this is a fault. */
export const SHARE_TOLERANCE = 1e-6;

export function checkShares(values: readonly number[], path: string): Problem {
  return checkNumbers(values, path, { min: -SHARE_TOLERANCE, max: 1 + SHARE_TOLERANCE });
}

/** Named shares, so a message points at `stations[2].shares.blocked` rather than an index. */
export function checkNamedShares(
  entries: ReadonlyArray<readonly [name: string, value: number]>,
  path: string,
): Problem {
  for (const [name, value] of entries) {
    if (typeof value !== 'number' || !Number.isFinite(value))
      return `${path}.${name} must be a finite number, got ${value}`;
    if (value < -SHARE_TOLERANCE || value > 1 + SHARE_TOLERANCE)
      return `${path}.${name} is ${value}; a share lies between 0 and 1`;
  }
  return null;
}
