// The run settings form speaks in labels; the shared schema's messages start with the field's key
// ("warmupMinutes must be from 0 to 525600"), so the key is swapped for the label people see.
import type { FieldIssue } from '../../../../shared/api/errors';
import type { RunSettingsInput } from '../../../../shared/scenario/run-settings';
import { sentenceFor } from '../../../lib/form-errors';

export const SETTINGS_FIELDS = ['hours', 'warmupMinutes', 'replications', 'seed', 'carriers'] as const;
export type SettingsField = (typeof SETTINGS_FIELDS)[number];

export const SETTINGS_LABELS: Record<SettingsField, string> = {
  hours: 'Hours simulated',
  warmupMinutes: 'Warm-up (minutes)',
  replications: 'Replications',
  seed: 'Seed',
  carriers: 'Carrier count',
};

export function settingsMessage(field: SettingsField, message: string): string {
  const label = SETTINGS_LABELS[field];
  return message.startsWith(`${field} `) ? `${label}${message.slice(field.length)}` : sentenceFor(label, message);
}

/** Number inputs hand over text; an empty box is "not given", anything else is left for the schema to judge. */
export const numberOrUndefined = (value: unknown) =>
  value === '' || value === null || value === undefined ? undefined : Number(value);

/** A seed of digits only is a number (as the CLI reads it); anything else is kept as text. */
export function seedFromText(value: unknown): string | number {
  const text = String(value ?? '').trim();
  return /^\d+$/.test(text) && Number.isSafeInteger(Number(text)) ? Number(text) : text;
}

export function newSeed(): number {
  return crypto.getRandomValues(new Uint32Array(1))[0];
}

/** Engine issues about the settings come back as "settings.<field>"; the rest belong to the scenario. */
export function splitSettingsIssues(issues: readonly FieldIssue[]): {
  settings: { field: SettingsField; message: string }[];
  scenario: FieldIssue[];
} {
  const settings: { field: SettingsField; message: string }[] = [];
  const scenario: FieldIssue[] = [];
  for (const issue of issues) {
    const field = SETTINGS_FIELDS.find((name) => issue.path === `settings.${name}`);
    if (field) settings.push({ field, message: issue.message });
    else scenario.push(issue);
  }
  return { settings, scenario };
}

export const DEFAULT_SETTINGS: RunSettingsInput = { hours: 8, warmupMinutes: 30, replications: 5, seed: 1 };
