// Sign-in attempt limits kept in PostgreSQL (rate-limiter-flexible's PostgreSQL store), so every server
// process shares the counts. An attempt is counted *before* the password is checked: a burst of parallel
// attempts cannot all reach the check while the count still reads zero. A successful sign-in gives back
// its points, so only failures accumulate for the real owner.
import { createHash } from 'node:crypto';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import type { DataSource } from 'typeorm';
import { HttpError } from '../http/http-error';

export interface SignInLimits {
  /** Attempts per account (e-mail) in one window, from any address. */
  perAccount: number;
  /** Attempts per source address in one window, across every account. */
  perAddress: number;
  windowSeconds: number;
}

export const DEFAULT_SIGN_IN_LIMITS: SignInLimits = { perAccount: 10, perAddress: 100, windowSeconds: 15 * 60 };

export interface SignInLimiter {
  /** Counts one attempt; throws a 429 when the account or the address has spent its attempts. */
  begin(email: string, address: string): Promise<void>;
  /** Gives the attempt back after a right password. */
  succeeded(email: string, address: string): Promise<void>;
}

/** Hashed, so keys fit the column whatever the e-mail's length and the table holds no addresses in clear. */
const keyOf = (kind: string, value: string) => `${kind}:${createHash('sha256').update(value).digest('base64url')}`;

function tooMany(res: RateLimiterRes): HttpError {
  const seconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  return new HttpError(
    429,
    'rate_limited',
    `Too many sign-in attempts; try again in ${Math.ceil(seconds / 60)} minute(s).`,
    [],
    { 'Retry-After': String(seconds) },
  );
}

export function createSignInLimiter(ds: DataSource, limits: SignInLimits = DEFAULT_SIGN_IN_LIMITS): SignInLimiter {
  const store = (points: number) =>
    new RateLimiterPostgres({
      storeClient: ds,
      storeType: 'typeorm',
      tableName: 'sign_in_attempts',
      tableCreated: true,
      points,
      duration: limits.windowSeconds,
    });
  const accounts = store(limits.perAccount);
  const addresses = store(limits.perAddress);
  const consume = async (limiter: RateLimiterPostgres, key: string) => {
    try {
      await limiter.consume(key);
    } catch (error) {
      if (error instanceof RateLimiterRes) throw tooMany(error);
      throw error;
    }
  };
  return {
    async begin(email, address) {
      await consume(addresses, keyOf('address', address));
      await consume(accounts, keyOf('account', email));
    },
    async succeeded(email, address) {
      await accounts.delete(keyOf('account', email));
      await addresses.reward(keyOf('address', address));
    },
  };
}
