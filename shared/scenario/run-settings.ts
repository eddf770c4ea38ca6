// How long and how often a scenario is simulated. Kept apart from the scenario so one scenario
// revision can be run under several settings, and every stored run says which it used.
import { z } from 'zod';
import { CARRIER_LIMITS } from './carriers';
import { between, wholeBetween } from './units';

export const RUN_LIMITS = {
  hoursMin: 0.01,
  /** One year of continuous operation. */
  hoursMax: 8_760,
  replicationsMax: 200,
  seedMaxLength: 64,
} as const;

export const seedSchema = z.union(
  [
    z
      .int({ error: 'seed must be a whole number or text' })
      .min(0, 'seed must be zero or more')
      .max(Number.MAX_SAFE_INTEGER),
    z
      .string()
      .trim()
      .min(1, 'seed must not be empty')
      .max(RUN_LIMITS.seedMaxLength, `seed must be at most ${RUN_LIMITS.seedMaxLength} characters`),
  ],
  { error: 'seed must be a whole number or text' },
);

export const runSettingsSchema = z.object({
  /** Simulated working time per replication, after the warm-up. */
  hours: between('hours', RUN_LIMITS.hoursMin, RUN_LIMITS.hoursMax).default(8),
  /** Time simulated before statistics are collected, so the line starts from a realistic state. */
  warmupMinutes: between('warmupMinutes', 0, RUN_LIMITS.hoursMax * 60).default(30),
  replications: wholeBetween('replications', 1, RUN_LIMITS.replicationsMax).default(5),
  seed: seedSchema.default(1),
  /** Overrides the scenario's carrier count, for carrier-count sweeps. */
  carriers: wholeBetween('carriers', 1, CARRIER_LIMITS.countMax).optional(),
});

export type RunSettings = z.infer<typeof runSettingsSchema>;
export type RunSettingsInput = z.input<typeof runSettingsSchema>;
