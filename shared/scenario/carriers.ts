// The carriers (count, size, motion) and the conveyor they run on: independent carriers with their
// own motion profile, or the baseline of the same process on a constant-speed belt or chain.
import { z } from 'zod';
import { between, nonNegative, positive, wholeBetween } from './units';

export const CARRIER_LIMITS = { countMax: 2_000, lengthMaxMm: 5_000, speedMaxMmPerS: 20_000 } as const;

export const motionProfileSchema = z.object({
  vMaxMmPerS: between('vMaxMmPerS', 1, CARRIER_LIMITS.speedMaxMmPerS),
  aMaxMmPerS2: positive('aMaxMmPerS2'),
  /** Without jerk the move is trapezoidal; with it, an S-curve. */
  jMaxMmPerS3: positive('jMaxMmPerS3').optional(),
});

export const carriersSchema = z.object({
  count: wholeBetween('count', 1, CARRIER_LIMITS.countMax),
  lengthMm: between('lengthMm', 1, CARRIER_LIMITS.lengthMaxMm),
  /** Least clear distance between two carriers on a lane. */
  minGapMm: nonNegative('minGapMm'),
  /** Motion with a part on board. */
  loaded: motionProfileSchema,
  /** Motion when empty; the loaded profile when absent. */
  empty: motionProfileSchema.optional(),
});

export const carrierConveyorSchema = z.object({ kind: z.literal('carriers') });

/**
 * Baseline: the same layout and process on a belt or chain conveyor. Pallets ride at constant belt
 * speed, queue at `pitchMm` spacing and need `stopAndLocateSeconds` at each station they work at.
 */
export const beltConveyorSchema = z.object({
  kind: z.literal('belt'),
  speedMmPerS: between('speedMmPerS', 1, CARRIER_LIMITS.speedMaxMmPerS),
  stopAndLocateSeconds: nonNegative('stopAndLocateSeconds'),
  /** Centre-to-centre spacing of queued pallets; at least the carrier length. */
  pitchMm: positive('pitchMm'),
});

export const conveyorSchema = z.discriminatedUnion('kind', [carrierConveyorSchema, beltConveyorSchema], {
  error: 'kind must be one of carriers, belt',
});

export type MotionProfileSpec = z.infer<typeof motionProfileSchema>;
export type Carriers = z.infer<typeof carriersSchema>;
export type Conveyor = z.infer<typeof conveyorSchema>;
