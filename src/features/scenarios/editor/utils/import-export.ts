// Scenario files: exported pretty-printed under the scenario's name; imported files are parsed and
// checked with the same schema the server uses, and every problem is listed with its path.
import { scenarioSchema, type Scenario } from '../../../../../shared/scenario/scenario';
import { formatIssuePath } from '../../../../../shared/scenario/issue-path';
import { downloadBlob, safeFilename } from '../../../../lib/export/download';
import type { PathIssue } from './paths';

export type ImportOutcome = { ok: true; document: Scenario } | { ok: false; issues: PathIssue[] };

/** Large enough for a 200-lane layout with empirical samples, small enough to parse without a pause. */
export const IMPORT_MAX_BYTES = 5_000_000;

export function parseScenarioText(text: string): ImportOutcome {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return { ok: false, issues: [{ path: '(file)', message: `is not JSON: ${error instanceof Error ? error.message : String(error)}` }] };
  }
  const parsed = scenarioSchema.safeParse(json);
  if (parsed.success) return { ok: true, document: parsed.data };
  return { ok: false, issues: parsed.error.issues.map((issue) => ({ path: formatIssuePath(issue.path), message: issue.message })) };
}

export async function readScenarioFile(file: File): Promise<ImportOutcome> {
  if (file.size > IMPORT_MAX_BYTES) {
    return { ok: false, issues: [{ path: '(file)', message: `is ${(file.size / 1e6).toFixed(1)} MB; a scenario file may be at most ${IMPORT_MAX_BYTES / 1e6} MB` }] };
  }
  return parseScenarioText(await file.text());
}

export function scenarioFileName(name: string, revisionNumber?: number): string {
  return safeFilename(revisionNumber === undefined ? name : `${name}-r${revisionNumber}`, 'json');
}

export function downloadScenario(document: Scenario, revisionNumber?: number): void {
  const blob = new Blob([`${JSON.stringify(document, null, 2)}\n`], { type: 'application/json' });
  downloadBlob(blob, scenarioFileName(document.name, revisionNumber));
}
