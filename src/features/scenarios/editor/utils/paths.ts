// Issue paths arrive in three spellings: zod's arrays, the API's "document.steps[2].stations[0]" and
// the engine's "steps[2].stations[0]". The editor keys everything by react-hook-form's dotted path.
import type { FieldError, FieldErrors } from 'react-hook-form';

export type SectionId = 'general' | 'track' | 'lanes' | 'transfers' | 'carriers' | 'process' | 'calendar' | 'conveyor';

export interface PathIssue {
  /** Dotted form path, e.g. steps.2.stations.0.positionMm */
  path: string;
  message: string;
}

/** "document.steps[2].stations[0].positionMm" → "steps.2.stations.0.positionMm". */
export function toFormPath(issuePath: string | readonly PropertyKey[]): string {
  const text = typeof issuePath === 'string' ? issuePath : issuePath.map(String).join('.');
  return text
    .replace(/\[(\d+)\]/g, '.$1')
    .replace(/^\.+/, '')
    .replace(/^document(\.|$)/, '');
}

/** "steps.2.stations.0.positionMm" → "steps[2].stations[0].positionMm", the way messages show paths. */
export function displayPath(formPath: string): string {
  if (formPath === '') return '(document)';
  return formPath
    .split('.')
    .reduce((out, key) => (/^\d+$/.test(key) ? `${out}[${key}]` : out ? `${out}.${key}` : key), '');
}

const SECTION_OF_ROOT: Record<string, SectionId> = {
  name: 'general',
  description: 'general',
  targetTaktSeconds: 'general',
  schemaVersion: 'general',
  track: 'track',
  decks: 'track',
  lanes: 'lanes',
  links: 'transfers',
  transfers: 'transfers',
  carriers: 'carriers',
  conveyor: 'conveyor',
  steps: 'process',
  calendar: 'calendar',
};

export function sectionOf(formPath: string): SectionId {
  return SECTION_OF_ROOT[formPath.split('.')[0] ?? ''] ?? 'general';
}

const isFieldError = (value: unknown): value is FieldError =>
  typeof value === 'object' &&
  value !== null &&
  typeof (value as { message?: unknown }).message === 'string' &&
  'type' in value;

/** Every message in react-hook-form's nested error object, with its dotted path. */
export function flattenErrors(errors: FieldErrors | undefined, prefix = ''): PathIssue[] {
  const out: PathIssue[] = [];
  for (const [key, value] of Object.entries(errors ?? {})) {
    if (key === 'ref' || typeof value !== 'object' || value === null) continue;
    const path = key === 'root' ? prefix : prefix ? `${prefix}.${key}` : key;
    if (isFieldError(value)) out.push({ path, message: value.message ?? '' });
    else out.push(...flattenErrors(value as FieldErrors, path));
  }
  return out;
}

/** Reads the message at a dotted path, including messages about a whole list (react-hook-form's "root"). */
export function errorAt(errors: FieldErrors, path: string): string | undefined {
  let node: unknown = errors;
  for (const key of path.split('.')) {
    if (typeof node !== 'object' || node === null) return undefined;
    node = (node as Record<string, unknown>)[key];
  }
  if (typeof node !== 'object' || node === null) return undefined;
  const own = (node as { message?: unknown }).message;
  if (typeof own === 'string' && own !== '') return own;
  const root = (node as { root?: { message?: unknown } }).root?.message;
  return typeof root === 'string' ? root : undefined;
}
