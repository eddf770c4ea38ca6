// Settings read from the environment by `npm start` and `npm run dev`, checked with a clear message.
import { SetupError } from './log';

export const HTTP_HOST = '127.0.0.1';

export function httpPort(): number {
  const raw = process.env.PORT;
  if (raw === undefined || raw === '') return 3000;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 1 || port > 65535) {
    throw new SetupError(`PORT must be a whole number from 1 to 65535, got "${raw}"`);
  }
  return port;
}

export const DEMO_ACCOUNTS = ['owner', 'engineer', 'viewer'].map((role) => `${role}@demo.lanewright.test`);
export const DEMO_PASSWORD = 'demo-password';

export function demoSignInText(): string {
  return [
    'Demo sign-in (password for each: demo-password):',
    ...DEMO_ACCOUNTS.map((email) => `  ${email}`),
    'Turn the demo off for a real deployment: LANEWRIGHT_DEMO=off, and delete the demo users.',
  ].join('\n');
}

/** Turns "address in use" into advice; other errors pass through unchanged. */
export function portInUseHelp(error: unknown, port: number, advice: string): unknown {
  const inUse = (error as NodeJS.ErrnoException).code === 'EADDRINUSE' || /already in use/i.test(String((error as Error).message));
  return inUse ? new SetupError(`port ${port} on ${HTTP_HOST} is already in use; ${advice}`) : error;
}
