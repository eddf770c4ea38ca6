// The engine's static line checks, run when a document is saved, so every stored revision is one the
// engine will simulate: each step has a station, the loop closes, the carriers fit on the track.
import { staticChecks } from '../../workers/engine/validate/static-checks';
import type { Scenario } from '../../shared/scenario/scenario';
import { badRequest } from '../http/http-error';
import { MAX_REPORTED_ISSUES } from '../http/validate';

export function assertRunnable(document: Scenario, field = 'document'): void {
  const issues = staticChecks(document).slice(0, MAX_REPORTED_ISSUES);
  if (issues.length === 0) return;
  const fields = issues.map((issue) => ({ path: `${field}.${issue.path}`, message: issue.message }));
  throw badRequest(
    `The scenario cannot be simulated as saved: ${fields.map((f) => `${f.path} ${f.message}`).join('; ')}`,
    fields,
  );
}
