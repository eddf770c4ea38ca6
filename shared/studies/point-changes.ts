// What makes one point of a study differ from its scenario revision: a few numeric fields set to a
// value or scaled by a factor. A path names a field of the scenario document by its keys and list
// indexes ("steps.2.stations.0.cycleTimeSeconds"). Scaling a distribution scales every time in it, so
// its mean moves by the factor and its shape (cv) stays; the engine's own checks then judge the result.
import { z } from 'zod';

export const CHANGE_OPS = ['set', 'scale'] as const;

export const pointChangeSchema = z.object({
  path: z
    .string({ error: 'must be text' })
    .regex(
      /^[A-Za-z][A-Za-z0-9]*(\.([A-Za-z][A-Za-z0-9]*|\d+))*$/,
      'must name a scenario field as keys and list indexes joined by dots, e.g. steps.1.stations.0.cycleTimeSeconds',
    )
    .max(200, 'must be at most 200 characters'),
  op: z.enum(CHANGE_OPS, { error: `must be one of ${CHANGE_OPS.join(', ')}` }),
  value: z.number({ error: 'must be a finite number' }),
});

export type PointChange = z.infer<typeof pointChangeSchema>;

export type ChangeOutcome = { ok: true; document: unknown } | { ok: false; path: string; message: string };

/** Parameters of each distribution kind that are times (scaled together); cv and k are shape. */
const TIME_KEYS = ['value', 'min', 'mode', 'max', 'mean', 'sd'] as const;

function scaleDistribution(d: Record<string, unknown>, factor: number): Record<string, unknown> {
  const out: Record<string, unknown> = { ...d };
  for (const key of TIME_KEYS) if (typeof out[key] === 'number') out[key] = (out[key] as number) * factor;
  if (Array.isArray(out.samples)) out.samples = out.samples.map((x) => (typeof x === 'number' ? x * factor : x));
  return out;
}

const isRecord = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null;

function applyOne(root: unknown, change: PointChange): string | null {
  const keys = change.path.split('.');
  let parent: unknown = root;
  for (const key of keys.slice(0, -1)) {
    if (!isRecord(parent) || !(key in parent)) return `the scenario has no field ${change.path}`;
    parent = (parent as Record<string, unknown>)[key];
  }
  const last = keys[keys.length - 1];
  if (!isRecord(parent) || !(last in parent)) return `the scenario has no field ${change.path}`;
  const holder = parent as Record<string, unknown>;
  const current = holder[last];
  if (typeof current === 'number') {
    holder[last] = change.op === 'set' ? change.value : current * change.value;
    return null;
  }
  if (change.op === 'scale' && isRecord(current) && typeof current.kind === 'string') {
    holder[last] = scaleDistribution(current, change.value);
    return null;
  }
  return `${change.path} is not a number${change.op === 'scale' ? ' or a distribution' : ''}, so it cannot be ${change.op === 'set' ? 'set' : 'scaled'}`;
}

/** A copy of the document with the changes made; the original is left as it was. */
export function applyPointChanges(document: unknown, changes: readonly PointChange[]): ChangeOutcome {
  const copy: unknown = structuredClone(document);
  for (const change of changes) {
    const problem = applyOne(copy, change);
    if (problem) return { ok: false, path: change.path, message: problem };
  }
  return { ok: true, document: copy };
}
