// Console output of the set-up scripts: one prefix so their lines stand out from the server's and vitest's.
export function say(message: string): void {
  console.log(`[lanewright] ${message}`);
}

/** A failure whose message tells the user what to do; printed without a stack trace. */
export class SetupError extends Error {
  override name = 'SetupError';
}

// Errors that already say what is wrong in words: this one, and the server's ConfigError.
const EXPLAINED = new Set(['SetupError', 'ConfigError']);

/** Prints an error for a person: an explained error as its message only, anything else with its stack. */
export function reportFailure(error: unknown): void {
  if (error instanceof Error && EXPLAINED.has(error.name)) console.error(`[lanewright] ${error.message}`);
  else console.error(error);
}

/** A database URL safe to print: the password replaced. */
export function redactUrl(url: string): string {
  try {
    const parsed = new URL(url);
    if (parsed.password) parsed.password = '***';
    return parsed.toString();
  } catch {
    return '(unparseable DATABASE_URL)';
  }
}
