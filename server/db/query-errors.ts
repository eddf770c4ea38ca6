// Recognises PostgreSQL errors the API answers on purpose rather than as failures.
import { QueryFailedError } from 'typeorm';

function sqlState(error: unknown): string | undefined {
  if (error instanceof QueryFailedError) return (error.driverError as { code?: string } | undefined)?.code;
  return (error as { code?: unknown } | null)?.code as string | undefined;
}

/** SQLSTATE 23505: a unique constraint refused a second row, typically when two requests raced. */
export function isUniqueViolation(error: unknown): boolean {
  return sqlState(error) === '23505';
}

/**
 * Values the database refused as data (out-of-range number, text it cannot encode, malformed JSON). Input
 * validation should catch these first; this is the net under it, so such input never answers 500.
 */
export function isRefusedValue(error: unknown): boolean {
  const code = sqlState(error);
  return code !== undefined && ['22003', '22P02', '22021', '22P05', '22001', '54000'].includes(code);
}

const CONNECTION_ERRORS = new Set(['ECONNREFUSED', 'ECONNRESET', 'ETIMEDOUT', 'EPIPE', 'ENOTFOUND', 'EAI_AGAIN']);
const CONNECTION_MESSAGES =
  /Connection terminated|connection timeout|Client has encountered a connection error|terminating connection|the database system is (starting up|shutting down|in recovery)|Connection is not established|timeout exceeded when trying to connect/i;

/**
 * The database cannot be reached or dropped the connection: SQLSTATE class 08 (connection exception), 57P0x
 * (administrator shutdown, crash, cannot connect now), a refused socket, or pg's own connection messages.
 */
export function isDatabaseUnavailable(error: unknown): boolean {
  const code = sqlState(error);
  if (code && (code.startsWith('08') || ['57P01', '57P02', '57P03'].includes(code) || CONNECTION_ERRORS.has(code)))
    return true;
  // TypeORM releases a transaction's connection when PostgreSQL drops it; the transaction's next statement
  // then meets this error instead of the connection error itself.
  if (error instanceof Error && error.name === 'QueryRunnerAlreadyReleasedError') return true;
  const errors = (error as { errors?: unknown[] } | null)?.errors;
  if (Array.isArray(errors) && errors.some((inner) => isDatabaseUnavailable(inner))) return true;
  const message = error instanceof Error ? error.message : '';
  return CONNECTION_MESSAGES.test(message);
}
