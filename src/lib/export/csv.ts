// CSV writing after RFC 4180 (Shafranovich, 2005, section 2): CRLF between records, fields holding a
// comma, double quote, CR or LF are enclosed in double quotes, and a double quote inside a field is
// doubled. Text cells are also guarded against formula injection (see FORMULA_TRIGGERS).
import { downloadBlob, safeFilename } from './download';

export type CsvValue = string | number | boolean | Date | null | undefined;

export type CsvColumn<T> =
  { header: string; key: keyof T & (string | number) } | { header: string; get: (row: T) => CsvValue };

/**
 * A text cell starting with one of these is read as a formula by spreadsheet programs, so it is
 * written with a leading apostrophe, which they show as plain text (OWASP, "CSV Injection", the
 * recommended prefix; tab and carriage return are on OWASP's list as well). Numbers are written as
 * numbers and never prefixed, so -3.5 stays a number.
 */
export const FORMULA_TRIGGERS = ['=', '+', '-', '@', '\t', '\r'] as const;

export class CsvError extends Error {
  constructor(
    readonly path: string,
    message: string,
  ) {
    super(`${path}: ${message}`);
    this.name = 'CsvError';
  }
}

const NEEDS_QUOTES = /[",\r\n]/;

export function csvField(value: CsvValue, path = 'value'): string {
  if (value === null || value === undefined) return '';
  if (typeof value === 'number') return String(value);
  if (typeof value === 'boolean') return value ? 'true' : 'false';
  if (value instanceof Date) {
    if (Number.isNaN(value.getTime())) throw new CsvError(path, 'is an invalid date');
    return value.toISOString();
  }
  if (typeof value !== 'string') {
    throw new CsvError(
      path,
      `cannot be written to CSV: expected text, a number, a boolean or a date, got ${typeof value}`,
    );
  }
  const guarded = FORMULA_TRIGGERS.some((trigger) => value.startsWith(trigger)) ? `'${value}` : value;
  return NEEDS_QUOTES.test(guarded) ? `"${guarded.replace(/"/g, '""')}"` : guarded;
}

function cellOf<T>(row: T, column: CsvColumn<T>): CsvValue {
  if ('get' in column) return column.get(row);
  return (row as Record<string | number, CsvValue>)[column.key];
}

function columnName<T>(column: CsvColumn<T>, index: number): string {
  return 'key' in column ? String(column.key) : column.header || `column ${index + 1}`;
}

/** The whole file as text; every record, the last one included, ends with CRLF. */
export function toCsv<T>(rows: readonly T[], columns: readonly CsvColumn<T>[]): string {
  if (columns.length === 0) throw new CsvError('columns', 'at least one column is needed');
  const lines = [columns.map((column, c) => csvField(column.header, `columns[${c}].header`)).join(',')];
  rows.forEach((row, r) => {
    if (row === null || typeof row !== 'object') throw new CsvError(`rows[${r}]`, 'must be an object or an array');
    lines.push(
      columns.map((column, c) => csvField(cellOf(row, column), `rows[${r}].${columnName(column, c)}`)).join(','),
    );
  });
  return lines.map((line) => `${line}\r\n`).join('');
}

/**
 * Saves the rows as a CSV file. A UTF-8 byte order mark leads the file so spreadsheet programs read
 * accented names correctly (common trade practice); CSV readers that follow RFC 4180 skip it.
 */
export function downloadCsv<T>(filename: string, rows: readonly T[], columns: readonly CsvColumn<T>[]): void {
  const text = toCsv(rows, columns);
  downloadBlob(new Blob(['\uFEFF', text], { type: 'text/csv;charset=utf-8' }), safeFilename(filename, 'csv'));
}
