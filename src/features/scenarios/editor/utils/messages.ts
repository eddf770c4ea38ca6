// The schema words messages about its own keys ("positionMm must be zero or more") or as the end of a
// sentence ("must be from 160 mm …"); beside a field they should read with the label people see.
import { sentenceFor } from '../../../../lib/form-errors';

export function fieldMessage(label: string, path: string, message: string): string {
  const key =
    path
      .split('.')
      .filter((part) => !/^\d+$/.test(part))
      .pop() ?? '';
  const bare = label.replace(/\s*\([^)]*\)$/, '');
  if (key !== '' && message.startsWith(`${key} `)) return `${bare}${message.slice(key.length)}`;
  return sentenceFor(label, message);
}
