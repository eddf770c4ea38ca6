// Counts failed sign-ins per e-mail and address in memory, so password guessing slows to a crawl without
// locking the real owner out from another address. Memory is bounded by pruning expired windows.
export interface AttemptLimiter {
  /** Seconds until another attempt is allowed, or 0 when allowed now. */
  retryAfter(key: string, now?: number): number;
  fail(key: string, now?: number): void;
  reset(key: string): void;
}

export function createAttemptLimiter(maxFailures = 10, windowMs = 15 * 60 * 1000): AttemptLimiter {
  const windows = new Map<string, { count: number; startedAt: number }>();
  const prune = (now: number) => {
    for (const [key, entry] of windows) if (now - entry.startedAt >= windowMs) windows.delete(key);
  };
  return {
    retryAfter(key, now = Date.now()) {
      const entry = windows.get(key);
      if (!entry || now - entry.startedAt >= windowMs || entry.count < maxFailures) return 0;
      return Math.ceil((entry.startedAt + windowMs - now) / 1000);
    },
    fail(key, now = Date.now()) {
      if (windows.size > 10_000) prune(now);
      const entry = windows.get(key);
      if (!entry || now - entry.startedAt >= windowMs) windows.set(key, { count: 1, startedAt: now });
      else entry.count += 1;
    },
    reset(key) {
      windows.delete(key);
    },
  };
}
