// Numbers as people type them: "9.5" and "9,5" both mean nine and a half, whatever the browser's
// language. Text with both separators or a thousands group ("1,234.5", "1.234") is ambiguous and is
// passed on unparsed, so the schema says it is not a number instead of the field guessing.
const PLAIN = /^[-+]?(\d+([.,]\d*)?|[.,]\d+)(e[-+]?\d+)?$/i;
const GROUPED = /^[-+]?\d{1,3}[.,]\d{3}$/;

export function parseDecimal(value: unknown): unknown {
  if (value === '' || value === null || value === undefined) return undefined;
  if (typeof value === 'number') return value;
  const text = String(value).trim().replace(/\s/g, '');
  if (text === '') return undefined;
  // "1,500" could be fifteen hundred or one and a half: refuse rather than guess.
  if (!PLAIN.test(text) || (GROUPED.test(text) && text.includes(','))) return text;
  return Number(text.replace(',', '.'));
}

/** Whether a typed value was refused as ambiguous or not a number, and why, for the field's note. */
export function decimalProblem(value: unknown): string | null {
  if (typeof value !== 'string' || value.trim() === '') return null;
  const text = value.trim().replace(/\s/g, '');
  if (GROUPED.test(text) && text.includes(','))
    return `"${value}" is ambiguous: write one and a half as 1.5 or 1,5 and fifteen hundred as 1500`;
  if (!PLAIN.test(text)) return `"${value}" is not a number: use digits with at most one decimal point or comma`;
  return null;
}
