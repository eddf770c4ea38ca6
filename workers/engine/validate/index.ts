// The engine's gate: a document is simulated only after the schema and the static line checks have
// accepted it. Every refusal names the field path and says what to change.
import { scenarioSchema, type Scenario } from '../../../shared/scenario/scenario';
import { formatIssuePath } from '../../../shared/scenario/issue-path';
import { staticChecks, type ValidationIssue } from './static-checks';

export type { ValidationIssue } from './static-checks';
export { checkCarrierCount, trackCapacity } from './static-checks';
export { gridlockFreeCarriers, smallestLoopCapacity } from './gridlock-bound';

export type ValidationOutcome = { ok: true; scenario: Scenario } | { ok: false; issues: ValidationIssue[] };

export function validateScenario(input: unknown): ValidationOutcome {
  const parsed = scenarioSchema.safeParse(input);
  if (!parsed.success) {
    return {
      ok: false,
      issues: parsed.error.issues.map((i) => ({ path: formatIssuePath(i.path), message: i.message })),
    };
  }
  const issues = staticChecks(parsed.data);
  return issues.length > 0 ? { ok: false, issues } : { ok: true, scenario: parsed.data };
}
