// Recognises PostgreSQL errors the API answers on purpose rather than as failures.
import { QueryFailedError } from 'typeorm';

/** SQLSTATE 23505: a unique constraint refused a second row, typically when two requests raced. */
export function isUniqueViolation(error: unknown): boolean {
  return error instanceof QueryFailedError && (error.driverError as { code?: string } | undefined)?.code === '23505';
}
