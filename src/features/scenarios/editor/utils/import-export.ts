// Scenario files: exported pretty-printed under the scenario's name; imported files are parsed and
// checked with the same schema the server uses, and every problem is listed with its path.
import { scenarioSchema, type Scenario } from '../../../../../shared/scenario/scenario';
import { formatIssuePath } from '../../../../../shared/scenario/issue-path';
import { downloadBlob, safeFilename } from '../../../../lib/export/download';
import { describeFormPath, readableMessage } from './describe-issue';
import { toFormPath, type PathIssue } from './paths';

export type ImportOutcome = { ok: true; document: Scenario } | { ok: false; issues: PathIssue[] };

/** Large enough for a 200-lane layout with empirical samples, small enough to parse without a pause. */
export const IMPORT_MAX_BYTES = 5_000_000;

export function parseScenarioText(text: string): ImportOutcome {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    return {
      ok: false,
      issues: [
        { path: '(file)', message: `This file is not JSON: ${error instanceof Error ? error.message : String(error)}` },
      ],
    };
  }
  if (typeof json !== 'object' || json === null || Array.isArray(json)) {
    return {
      ok: false,
      issues: [{ path: '(file)', message: 'This file is not a Lanewright scenario: it holds no scenario object' }],
    };
  }
  const parsed = scenarioSchema.safeParse(json);
  if (parsed.success) return { ok: true, document: parsed.data };
  const record = json as Record<string, unknown>;
  // Top-level fields absent altogether mean some other JSON file, not a damaged scenario: say that
  // once instead of listing every field the schema wanted.
  const absent = [
    ...new Set(
      parsed.error.issues
        .filter((i) => i.path.length === 1 && record[String(i.path[0])] === undefined)
        .map((i) => String(i.path[0])),
    ),
  ];
  if (absent.length > 0) {
    const listed = absent.map((key) => `'${key}'`).join(', ');
    const what = absent.length === 1 ? `the field ${listed} is missing` : `the fields ${listed} are missing`;
    return { ok: false, issues: [{ path: '(file)', message: `This file is not a Lanewright scenario: ${what}` }] };
  }
  return {
    ok: false,
    issues: parsed.error.issues.map((issue) => {
      const where = describeFormPath(toFormPath(issue.path), json);
      const missing = valueAt(json, issue.path) === undefined;
      return {
        path: formatIssuePath(issue.path),
        message: missing ? `${where} is missing` : `${where}: ${readableMessage(issue.message)}`,
      };
    }),
  };
}

function valueAt(root: unknown, path: readonly PropertyKey[]): unknown {
  let node = root;
  for (const key of path)
    node = typeof node === 'object' && node !== null ? (node as Record<PropertyKey, unknown>)[key] : undefined;
  return node;
}

export async function readScenarioFile(file: File): Promise<ImportOutcome> {
  if (file.size > IMPORT_MAX_BYTES) {
    return {
      ok: false,
      issues: [
        {
          path: '(file)',
          message: `This file is ${(file.size / 1e6).toFixed(1)} MB; a scenario file may be at most ${IMPORT_MAX_BYTES / 1e6} MB`,
        },
      ],
    };
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
