// The set-up scripts' own settings from the environment, parsed once: the private cluster's port, plus
// the server's settings (server/config.ts) they act on, so a bad value stops the set-up with the same
// readable list the server gives.
import { z } from 'zod';
import { loadConfig, type ServerConfig } from '../config';
import { SetupError } from './log';

export const DEFAULT_PG_PORT = 54329;

const setupSchema = z.object({
  LANEWRIGHT_PG_PORT: z.coerce
    .number({ message: 'must be a number' })
    .int({ message: 'must be a whole number from 1024 to 65535' })
    .min(1024, { message: 'must be a whole number from 1024 to 65535' })
    .max(65535, { message: 'must be a whole number from 1024 to 65535' })
    .default(DEFAULT_PG_PORT),
});

export type SetupConfig = z.infer<typeof setupSchema> & ServerConfig;

export function loadSetupConfig(env: NodeJS.ProcessEnv = process.env): SetupConfig {
  const own = Object.fromEntries(Object.entries(env).filter((entry) => entry[1] !== undefined && entry[1] !== ''));
  const parsed = setupSchema.safeParse(own);
  if (!parsed.success) {
    throw new SetupError(
      parsed.error.issues
        .map((issue) => `${issue.path.join('.')}: ${issue.message}, got "${env[String(issue.path[0])]}"`)
        .join('\n'),
    );
  }
  return { ...loadConfig(env), ...parsed.data };
}
