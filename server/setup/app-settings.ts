// What `npm start` and `npm run dev` print around the server's own settings (server/config.ts).
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../db/seed/demo';
import { SetupError } from './log';

export const HTTP_HOST = '127.0.0.1';

export function demoSignInText(): string {
  return [
    `Demo sign-in (password for each: ${DEMO_PASSWORD}):`,
    ...DEMO_ACCOUNTS.map(({ email }) => `  ${email}`),
    'Turn the demo off for a real deployment: LANEWRIGHT_DEMO=off, and delete the demo users.',
  ].join('\n');
}

/** Turns "address in use" into advice; other errors pass through unchanged. */
export function portInUseHelp(error: unknown, port: number, advice: string): unknown {
  const inUse =
    (error as NodeJS.ErrnoException).code === 'EADDRINUSE' || /already in use/i.test(String((error as Error).message));
  return inUse ? new SetupError(`port ${port} is already in use; ${advice}`) : error;
}
