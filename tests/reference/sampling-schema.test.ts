// The distribution schema refuses what the samplers cannot take, and says what to change.
import { describe, expect, it } from 'vitest';
import { distributionSchema } from '../../shared/scenario/distribution';

function problems(input: unknown): string[] {
  const result = distributionSchema.safeParse(input);
  return result.success ? [] : result.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
}

describe('distribution schema', () => {
  it('accepts every kind with sensible parameters and defaults a normal cut to zero', () => {
    const valid = [
      { kind: 'fixed', value: 9 },
      { kind: 'uniform', min: 3, max: 5 },
      { kind: 'triangular', min: 9, mode: 12, max: 15 },
      { kind: 'lognormal', mean: 9, cv: 0.2 },
      { kind: 'exponential', mean: 3600 },
      { kind: 'erlang', mean: 12, k: 4 },
      { kind: 'gamma', mean: 12, cv: 0.5 },
      { kind: 'empirical', samples: [8.2, 9.1, 0] },
    ];
    for (const d of valid) expect(problems(d)).toEqual([]);
    expect(distributionSchema.parse({ kind: 'normal', mean: 12, sd: 3 })).toEqual({
      kind: 'normal',
      mean: 12,
      sd: 3,
      min: 0,
    });
  });

  it.each([
    [{ kind: 'uniform', min: 5, max: 3 }, 'max: min must be below max; for a constant time use kind "fixed"'],
    [{ kind: 'triangular', min: 9, mode: 16, max: 15 }, 'mode: mode must lie between min and max'],
    [{ kind: 'normal', mean: 12, sd: 0 }, 'sd: sd must be above zero'],
    [
      { kind: 'normal', mean: 12, sd: 3, min: 13 },
      'min: min must not exceed mean; a normal cut off above its mean is better given as triangular or lognormal',
    ],
    [{ kind: 'normal', mean: Number.NaN, sd: 3 }, 'mean: mean must be a finite number'],
    [{ kind: 'exponential', mean: Number.POSITIVE_INFINITY }, 'mean: mean must be a finite number'],
    [{ kind: 'exponential', mean: '60' }, 'mean: mean must be a number'],
    [{ kind: 'exponential' }, 'mean: mean is required'],
    [{ kind: 'fixed', value: -1 }, 'value: value must be zero or more'],
    [{ kind: 'erlang', mean: 12, k: 2.5 }, 'k: k must be a whole number (the number of exponential phases)'],
    [
      { kind: 'gamma', mean: 12, cv: 9 },
      'cv: cv must be at most 5; a larger spread is better given as empirical samples',
    ],
    [{ kind: 'empirical', samples: [0, 0] }, 'samples: samples must contain at least one time above zero'],
    [{ kind: 'empirical', samples: [] }, 'samples: samples must hold at least one measured time'],
    [{ kind: 'empirical', samples: [3, -1] }, 'samples.1: each sample must be zero or more'],
    [
      { kind: 'weibull', mean: 3 },
      'kind: kind must be one of fixed, uniform, triangular, normal, lognormal, exponential, erlang, gamma, empirical',
    ],
  ])('%j is refused with a message naming the field', (input, message) => {
    expect(problems(input)).toEqual([message]);
  });

  it('refuses something that is not a distribution at all', () => {
    expect(problems(null)).toEqual([
      ': a distribution must be an object with a kind and its parameters, e.g. { "kind": "fixed", "value": 9 }',
    ]);
  });

  it('refuses a time study longer than the limit', () => {
    const samples = new Array(100_001).fill(1);
    expect(problems({ kind: 'empirical', samples })[0]).toMatch(/^samples: samples may hold at most 100000 times/);
  });
});
