// The test run's own settings from the environment, parsed in one place. `npm test` (tests/run.ts) sets the
// database URLs and the summary file; a person running vitest by hand sets DATABASE_URL.
import { z } from 'zod';

const testEnvSchema = z.object({
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, { message: 'must be a PostgreSQL URL' })
    .optional(),
  LANEWRIGHT_BROWSER_DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, { message: 'must be a PostgreSQL URL' })
    .optional(),
  /** Debian's Chromium unless set: the browser tests drive it through playwright-core (no browser download). */
  LANEWRIGHT_CHROMIUM: z.string().default('/usr/bin/chromium'),
  /** Where the summary reporter writes the closing line for tests/run.ts to print after clean-up. */
  LANEWRIGHT_SUMMARY_FILE: z.string().optional(),
});

export type TestEnv = z.infer<typeof testEnvSchema>;

export function testEnv(env: NodeJS.ProcessEnv = process.env): TestEnv {
  const present = Object.fromEntries(Object.entries(env).filter((entry) => entry[1] !== undefined && entry[1] !== ''));
  const parsed = testEnvSchema.safeParse(present);
  if (parsed.success) return parsed.data;
  throw new Error(
    `The test environment has problems:\n${parsed.error.issues.map((i) => `  - ${i.path.join('.')}: ${i.message}`).join('\n')}`,
  );
}
