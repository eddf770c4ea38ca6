// Request body limits per route. Each fits the largest legitimate body of its route, and no more:
// - a scenario document at every schema limit (200 lanes of 100 module entries, 500 stations, 200,000
//   measured times at full double precision) is about 5 MB (tests/api/request-bounds.test.ts builds it
//   and checks it fits);
// - a stored run carries its full result (heatmaps, per-station tables); see docs/server-hardening.md for
//   the measured size of a realistic result;
// - everything else (sign-in, names, members, settings) is a few hundred bytes.
import type { Request } from 'express';

export const BODY_LIMITS = {
  scenario: 6 * 1024 * 1024,
  run: 8 * 1024 * 1024,
  other: 64 * 1024,
} as const;

/** The largest body any route accepts. */
export const JSON_BODY_LIMIT_BYTES = Math.max(...Object.values(BODY_LIMITS));

const UUID = '[0-9a-fA-F-]{36}';
const ROUTE_LIMITS: { pattern: RegExp; kind: keyof typeof BODY_LIMITS }[] = [
  { pattern: new RegExp(`^/scenarios/${UUID}/runs/?$`), kind: 'run' },
  // A study job's result carries its block's summaries and mean series (and, stored before, a series per summary).
  { pattern: new RegExp(`^/studies/${UUID}/results/?$`), kind: 'run' },
  { pattern: new RegExp(`^/(projects/${UUID}/scenarios|scenarios/${UUID}/revisions)/?$`), kind: 'scenario' },
];

/** The body kind of an API request; `path` is relative to /api. */
export function bodyKindOf(req: Pick<Request, 'path'>): keyof typeof BODY_LIMITS {
  return ROUTE_LIMITS.find((route) => route.pattern.test(req.path))?.kind ?? 'other';
}

export function formatBytes(bytes: number): string {
  return bytes >= 1024 * 1024 ? `${Math.round(bytes / 1048576)} MB` : `${Math.round(bytes / 1024)} KB`;
}
