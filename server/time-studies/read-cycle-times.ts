// Reads the measured cycle times out of a time study's CSV text: finds the separator (comma, semicolon or
// tab), whether the first row is a header, and the column holding the times (named like cycle, seconds or
// time, or else the only numeric one); accepts a decimal comma. Problems name the row and the column.
import Papa from 'papaparse';
import type { FieldIssue } from '../../shared/api/errors';
import { TIME_STUDY_LIMITS } from '../../shared/api/time-studies';
import { badRequest, HttpError } from '../http/http-error';

export interface CycleTimeColumn {
  /** The header of the column the times came from, or "column N" when the file has no header. */
  column: string;
  samples: number[];
}

const SEPARATORS = ['\t', ';', ','] as const;
/** A one-column file still needs a separator for the parser: the unit separator, which text never holds. */
const ONE_COLUMN = '\u001f';
/** Enough lines to judge the separator and the numeric columns without reading the whole file twice. */
const SNIFF_LINES = 50;
/** Past this many bad rows the message lists only the first ones; the count is still given. */
const REPORTED_PROBLEMS = 5;
/** Name patterns in order of preference: "cycle" beats "seconds", which beats "time" (e.g. a timestamp). */
const NAME_PATTERNS = [/cycle/i, /^s$|sec|\(s\)|\[s\]/i, /time|duration/i];

const NUMBER = /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/;

/** A number with a decimal point or a decimal comma; null for anything else (thousands separators too). */
export function parseDecimal(cell: string): number | null {
  const text = cell.trim();
  if (!NUMBER.test(text)) return null;
  const value = Number(text.replace(',', '.'));
  return Number.isFinite(value) ? value : null;
}

/**
 * The separator that appears the same number of times (at least once) on every sampled line. A comma
 * that is not on every line is taken as a decimal comma in a one-column file.
 */
function findSeparator(text: string): string {
  const lines = text
    .split(/\r\n|\n|\r/)
    .filter((l) => l.trim() !== '')
    .slice(0, SNIFF_LINES);
  for (const sep of SEPARATORS) {
    const counts = lines.map((l) => l.split(sep).length - 1);
    if (counts.length > 0 && counts[0] > 0 && counts.every((c) => c === counts[0])) return sep;
  }
  // Short rows (a missing last cell) break the equal count; a separator in the header and in most lines still counts.
  for (const sep of SEPARATORS)
    if (lines.length > 0 && lines[0].includes(sep) && lines.filter((l) => l.includes(sep)).length * 2 > lines.length)
      return sep;
  return ONE_COLUMN;
}

const isBlank = (row: readonly string[]) => row.every((cell) => cell.trim() === '');

function chooseColumn(
  header: string[] | null,
  data: string[][],
  width: number,
  separator: string,
): { index: number; name: string } {
  const names = Array.from({ length: width }, (_, i) => (header?.[i]?.trim() ? header[i].trim() : `column ${i + 1}`));
  const sample = data.slice(0, SNIFF_LINES);
  const counts = names.map((_, i) => {
    const filled = sample.filter((row) => (row[i] ?? '').trim() !== '');
    return { filled: filled.length, numbers: filled.filter((row) => parseDecimal(row[i]) !== null).length };
  });
  const numeric = counts.map((c) => c.filled > 0 && c.numbers * 2 > c.filled);
  // A named column wins even when many of its cells are bad, so the answer lists those rows.
  const named = (accept: (i: number) => boolean) => {
    for (const pattern of NAME_PATTERNS) {
      const index = header ? names.findIndex((name, i) => pattern.test(name) && accept(i)) : -1;
      if (index >= 0) return { index, name: names[index] };
    }
    return null;
  };
  const byName = named((i) => numeric[i]) ?? named((i) => counts[i].numbers > 0);
  if (byName) return byName;
  const candidates = names.map((_, i) => i).filter((i) => numeric[i]);
  const listed = names.join(', ');
  if (candidates.length === 1) return { index: candidates[0], name: names[candidates[0]] };
  if (candidates.length === 0)
    throw badRequest(`No numeric column found; columns are: ${listed}.`, [
      { path: 'file', message: `has no numeric column; columns are: ${listed}` },
    ]);
  const several = candidates.map((i) => names[i]).join(', ');
  // "12,5" on every line of a one-column file without a header looks exactly like two columns.
  const decimalComma =
    !header && separator === ',' && width === 2
      ? ' If the file is one column of times with a decimal comma, add a header row such as "cycle_s".'
      : '';
  throw badRequest(
    `Several numeric columns (${several}) and none is named like cycle, seconds or time; name the column of cycle times so, or remove the others.${decimalComma}`,
    [{ path: 'file', message: `has several numeric columns (${several}); name the cycle-time column "cycle_s"` }],
  );
}

function tooManyRows(rows: number): HttpError {
  const limit = TIME_STUDY_LIMITS.rows.toLocaleString('en-GB');
  return new HttpError(
    413,
    'payload_too_large',
    `The file has ${rows.toLocaleString('en-GB')} rows of times; the limit is ${limit}. Thin the time study or split it.`,
    [{ path: 'file', message: `has ${rows} rows; the limit is ${limit}` }],
  );
}

function cellProblem(cell: string, value: number | null): string | null {
  if (cell.trim() === '') return 'the cell is empty';
  if (value === null) return `"${cell.trim().slice(0, 40)}" is not a number`;
  if (value < 0) return `${cell.trim()} is below zero; a cycle time cannot be negative`;
  if (value > TIME_STUDY_LIMITS.maxSeconds)
    return `${cell.trim().slice(0, 40)} s is more than ${TIME_STUDY_LIMITS.maxSeconds.toLocaleString('en')} s (one day); times are in seconds, so check the unit`;
  return null;
}

export function readCycleTimes(text: string): CycleTimeColumn {
  const separator = findSeparator(text);
  const parsed = Papa.parse<string[]>(text, { delimiter: separator, skipEmptyLines: false });
  const quoteError = parsed.errors.find((e) => e.type === 'Quotes');
  if (quoteError) {
    const row = (quoteError.row ?? 0) + 1;
    throw badRequest(`Row ${row}: ${quoteError.message.toLowerCase()}; check the quotes in that row.`, [
      { path: 'file', message: `row ${row}: ${quoteError.message.toLowerCase()}` },
    ]);
  }
  const rows = parsed.data;
  const firstIndex = rows.findIndex((row) => !isBlank(row));
  if (firstIndex < 0)
    throw badRequest('The file is empty; it needs one cycle time per row.', [{ path: 'file', message: 'is empty' }]);
  const hasHeader = rows[firstIndex].some((cell) => cell.trim() !== '' && parseDecimal(cell) === null);
  const header = hasHeader ? rows[firstIndex] : null;
  const dataStart = hasHeader ? firstIndex + 1 : firstIndex;
  const dataRows = rows.slice(dataStart);
  const filled = dataRows.filter((row) => !isBlank(row)).length;
  if (filled > TIME_STUDY_LIMITS.rows) throw tooManyRows(filled);
  if (filled === 0)
    throw badRequest('The file has a header row but no cycle times below it.', [
      { path: 'file', message: 'has no rows of cycle times' },
    ]);

  const width = Math.max(...rows.slice(firstIndex, firstIndex + SNIFF_LINES).map((row) => row.length));
  const { index, name } = chooseColumn(
    header,
    dataRows.filter((row) => !isBlank(row)),
    width,
    separator,
  );
  const samples: number[] = [];
  const problems: FieldIssue[] = [];
  let problemCount = 0;
  dataRows.forEach((row, i) => {
    if (isBlank(row)) return;
    const cell = row[index] ?? '';
    const value = parseDecimal(cell);
    const problem = cellProblem(cell, value);
    if (problem === null && value !== null) return void samples.push(value);
    problemCount += 1;
    if (problems.length < REPORTED_PROBLEMS)
      problems.push({ path: 'file', message: `row ${dataStart + i + 1}, column "${name}": ${problem}` });
  });
  if (problemCount > 0) {
    const more = problemCount > problems.length ? ` (and ${problemCount - problems.length} more)` : '';
    const lead = problemCount === 1 ? 'One row could not be read' : `${problemCount} rows could not be read`;
    throw badRequest(`${lead}: ${problems.map((p) => p.message).join('; ')}${more}.`, problems);
  }
  return { column: name, samples };
}
