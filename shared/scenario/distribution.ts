// Random quantities of a scenario (cycle times, time between failures, repair times), in seconds.
// The schema is the single definition: the client form, the API check and the engine all use it.
import { z } from 'zod';

/** Limits kept beside the schema so forms and messages quote the same numbers. */
export const DISTRIBUTION_LIMITS = {
  /** Shape parameters above this make a cycle time mostly noise and the sampler numerically fragile. */
  cvMax: 5,
  erlangKMax: 100,
  empiricalSamplesMax: 100_000,
} as const;

/** zod 4 numbers already refuse NaN and Infinity; the message says which of the three mistakes it was. */
export const finiteNumber = (name: string) =>
  z.number({
    error: (issue) =>
      issue.input === undefined
        ? `${name} is required`
        : typeof issue.input === 'number'
          ? `${name} must be a finite number`
          : `${name} must be a number`,
  });
const nonNegative = (name: string) => finiteNumber(name).refine((v) => v >= 0, `${name} must be zero or more`);
const positive = (name: string) => finiteNumber(name).refine((v) => v > 0, `${name} must be above zero`);
const cv = positive('cv').refine(
  (v) => v <= DISTRIBUTION_LIMITS.cvMax,
  `cv must be at most ${DISTRIBUTION_LIMITS.cvMax}; a larger spread is better given as empirical samples`,
);

export const fixedSchema = z.object({ kind: z.literal('fixed'), value: nonNegative('value') });

export const uniformSchema = z
  .object({ kind: z.literal('uniform'), min: nonNegative('min'), max: nonNegative('max') })
  .refine((d) => d.min < d.max, {
    path: ['max'],
    message: 'min must be below max; for a constant time use kind "fixed"',
  });

export const triangularSchema = z
  .object({
    kind: z.literal('triangular'),
    min: nonNegative('min'),
    mode: nonNegative('mode'),
    max: nonNegative('max'),
  })
  .refine((d) => d.min < d.max, {
    path: ['max'],
    message: 'min must be below max; for a constant time use kind "fixed"',
  })
  .refine((d) => d.mode >= d.min && d.mode <= d.max, {
    path: ['mode'],
    message: 'mode must lie between min and max',
  });

export const normalSchema = z
  .object({
    kind: z.literal('normal'),
    mean: nonNegative('mean'),
    sd: positive('sd'),
    /** Draws below min are redrawn: the distribution is truncated, not clipped. */
    min: nonNegative('min').default(0),
  })
  .refine((d) => d.min <= d.mean, {
    path: ['min'],
    message: 'min must not exceed mean; a normal cut off above its mean is better given as triangular or lognormal',
  });

export const lognormalSchema = z.object({ kind: z.literal('lognormal'), mean: positive('mean'), cv });

export const exponentialSchema = z.object({ kind: z.literal('exponential'), mean: positive('mean') });

export const erlangSchema = z.object({
  kind: z.literal('erlang'),
  mean: positive('mean'),
  k: finiteNumber('k')
    .refine(Number.isInteger, 'k must be a whole number (the number of exponential phases)')
    .refine((k) => k >= 1 && k <= DISTRIBUTION_LIMITS.erlangKMax, {
      message: `k must be from 1 to ${DISTRIBUTION_LIMITS.erlangKMax}; for a nearly constant time use kind "gamma" with a small cv`,
    }),
});

export const gammaSchema = z.object({ kind: z.literal('gamma'), mean: positive('mean'), cv });

export const empiricalSchema = z.object({
  kind: z.literal('empirical'),
  samples: z
    .array(nonNegative('each sample'), { error: 'samples must be a list of numbers' })
    .min(1, 'samples must hold at least one measured time')
    .max(
      DISTRIBUTION_LIMITS.empiricalSamplesMax,
      `samples may hold at most ${DISTRIBUTION_LIMITS.empiricalSamplesMax} times; thin the time study or fit a distribution`,
    )
    .refine((s) => s.length === 0 || s.some((v) => v > 0), 'samples must contain at least one time above zero'),
});

export const distributionSchema = z.discriminatedUnion(
  'kind',
  [
    fixedSchema,
    uniformSchema,
    triangularSchema,
    normalSchema,
    lognormalSchema,
    exponentialSchema,
    erlangSchema,
    gammaSchema,
    empiricalSchema,
  ],
  {
    error: (issue) =>
      typeof issue.input !== 'object' || issue.input === null
        ? 'a distribution must be an object with a kind and its parameters, e.g. { "kind": "fixed", "value": 9 }'
        : 'kind must be one of fixed, uniform, triangular, normal, lognormal, exponential, erlang, gamma, empirical',
  },
);

export type Distribution = z.infer<typeof distributionSchema>;
export type DistributionKind = Distribution['kind'];
