// Clean-up on Ctrl-C, SIGTERM or a failed start: the steps run newest first (HTTP server, then the data
// source, then PostgreSQL if this process started it). A second Ctrl-C (after 1.5 s) exits at once.
import { reportFailure, say } from './log';

const steps: Array<() => Promise<void>> = [];
let running: Promise<void> | undefined;

export function onCleanup(step: () => Promise<void>): void {
  steps.push(step);
}

export function cleanUp(): Promise<void> {
  running ??= (async () => {
    while (steps.length > 0) {
      const step = steps.pop()!;
      try {
        await step();
      } catch (error) {
        reportFailure(error);
      }
    }
  })();
  return running;
}

/** Makes SIGINT and SIGTERM clean up and exit; call once at the start of a long-running script. */
export function exitOnSignals(): void {
  let signalledAt: number | undefined;
  const handler = (signal: NodeJS.Signals) => {
    if (signalledAt !== undefined) {
      // One Ctrl-C can arrive twice: from the terminal and relayed by tsx's parent process.
      if (Date.now() - signalledAt < 1_500) return;
      say(`${signal} again: exiting without finishing clean-up`);
      process.exit(130);
    }
    signalledAt = Date.now();
    say(`${signal}: shutting down`);
    void cleanUp().then(() => process.exit(0));
  };
  process.on('SIGINT', handler);
  process.on('SIGTERM', handler);
}

/** Ends a script that failed: prints why, cleans up, exits 1. */
export async function failAndExit(error: unknown): Promise<never> {
  reportFailure(error);
  await cleanUp();
  process.exit(1);
}
