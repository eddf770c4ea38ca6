// Deletes expired sessions now and then. lucia already refuses them when presented; this only keeps the
// table from growing with sessions nobody comes back to.
import type { DataSource } from 'typeorm';
import { createSessionAdapter } from './session-adapter';

const HOUR_MS = 60 * 60 * 1000;

export function sweepExpiredSessions(ds: DataSource, everyMs = HOUR_MS): () => void {
  const adapter = createSessionAdapter(ds);
  const sweep = () => {
    adapter
      .deleteExpiredSessions()
      .catch((error: unknown) =>
        console.error('Could not delete expired sessions:', error instanceof Error ? error.message : error),
      );
  };
  sweep();
  const timer = setInterval(sweep, everyMs);
  timer.unref();
  return () => clearInterval(timer);
}
