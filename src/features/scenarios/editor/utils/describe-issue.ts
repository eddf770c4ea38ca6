// Problems said the way an engineer reads the scenario: "Station 'Press 1', cycle time mean" rather
// than steps.2.stations.0.cycleTimeSeconds.mean, and "is missing" rather than the schema's wording.

const ITEM_LABEL: Record<string, string> = {
  steps: 'Step',
  stations: 'Station',
  lanes: 'Lane',
  decks: 'Deck',
  transfers: 'Transfer',
  links: 'Link',
  modules: 'Module group',
  shifts: 'Shift',
  breaks: 'Break',
};

// Units are in the field's own editor label; the words alone name the field.
const UNIT_WORDS = new Set(['seconds', 'mm', 'm', 's', 'per', 'percent']);

function fieldWords(key: string): string {
  const words = key
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .toLowerCase()
    .split(' ');
  while (words.length > 1 && UNIT_WORDS.has(words[words.length - 1])) words.pop();
  return words.join(' ');
}

function nameAt(value: unknown): string | null {
  if (typeof value !== 'object' || value === null) return null;
  const name = (value as { name?: unknown }).name;
  return typeof name === 'string' && name.trim() !== '' ? name : null;
}

/** "steps.2.stations.0.cycleTimeSeconds.mean" in a document → "Station 'Press 1', cycle time mean". */
export function describeFormPath(formPath: string, document: unknown): string {
  if (formPath === '') return 'The file';
  const keys = formPath.split('.');
  const places: string[] = [];
  const fields: string[] = [];
  let node: unknown = document;
  for (let i = 0; i < keys.length; i++) {
    const key = keys[i];
    const next = typeof node === 'object' && node !== null ? (node as Record<string, unknown>)[key] : undefined;
    const index = keys[i + 1];
    if (ITEM_LABEL[key] && index !== undefined && /^\d+$/.test(index)) {
      const item = Array.isArray(next) ? next[Number(index)] : undefined;
      const name = nameAt(item);
      // The innermost named item says where; outer ones only add noise.
      places.splice(
        0,
        places.length,
        name ? `${ITEM_LABEL[key]} '${name}'` : `${ITEM_LABEL[key]} ${Number(index) + 1}`,
      );
      fields.length = 0;
      node = item;
      i++;
      continue;
    }
    if (/^\d+$/.test(key)) fields.push(`no. ${Number(key) + 1}`);
    else fields.push(fieldWords(key));
    node = next;
  }
  const field = fields.join(' ');
  if (places.length === 0) return field.charAt(0).toUpperCase() + field.slice(1);
  return field ? `${places[0]}, ${field}` : places[0];
}

/** The schema's "expected object, received undefined" means the field is not there at all. */
export function readableMessage(message: string): string {
  if (/received undefined/i.test(message)) return 'is missing';
  return message.replace(/^Invalid input: /, '');
}
