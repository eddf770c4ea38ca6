import { describe, expect, it } from 'vitest';
import { csvField, CsvError, toCsv, type CsvColumn } from '../../../src/lib/export/csv';

// Shafranovich, "Common Format and MIME Type for Comma-Separated Values (CSV) Files", RFC 4180, 2005,
// section 2, rules 1–7 and their examples.
describe('CSV after RFC 4180', () => {
  type Row = { a: string; b: string; c: string };
  const columns: CsvColumn<Row>[] = [
    { header: 'field_name', key: 'a' },
    { header: 'field_name', key: 'b' },
    { header: 'field_name', key: 'c' },
  ];

  it('ends each record with CRLF and puts the header first (rules 1 and 3)', () => {
    expect(
      toCsv(
        [
          { a: 'aaa', b: 'bbb', c: 'ccc' },
          { a: 'zzz', b: 'yyy', c: 'xxx' },
        ],
        columns,
      ),
    ).toBe('field_name,field_name,field_name\r\naaa,bbb,ccc\r\nzzz,yyy,xxx\r\n');
  });

  it('encloses fields holding line breaks in double quotes (rule 6: "b CRLF bb")', () => {
    expect(toCsv([{ a: 'aaa', b: 'b\r\nbb', c: 'ccc' }], columns)).toBe(
      'field_name,field_name,field_name\r\naaa,"b\r\nbb",ccc\r\n',
    );
  });

  it('doubles a double quote inside a quoted field (rule 7: "b""bb")', () => {
    expect(csvField('b"bb')).toBe('"b""bb"');
  });

  it('quotes fields holding commas and leaves plain fields and spaces alone (rule 4: spaces are part of a field)', () => {
    expect(csvField('Press, left')).toBe('"Press, left"');
    expect(csvField(' padded ')).toBe(' padded ');
    expect(csvField('x\ny')).toBe('"x\ny"');
  });

  it('writes numbers, booleans, dates and empty cells plainly', () => {
    expect([csvField(-3.5), csvField(0.1 + 0.2), csvField(true), csvField(null), csvField(undefined)]).toEqual([
      '-3.5',
      '0.30000000000000004',
      'true',
      '',
      '',
    ]);
    expect(csvField(new Date(Date.UTC(2026, 0, 2, 3, 4, 5)))).toBe('2026-01-02T03:04:05.000Z');
  });
});

describe('formula-injection guard', () => {
  // OWASP, "CSV Injection": cells starting with =, +, -, @, tab or carriage return are prefixed with a
  // single quote so spreadsheet programs show them as text.
  it.each([
    ['=SUM(A1:A9)', "'=SUM(A1:A9)"],
    ['+1', "'+1"],
    ['-2+3', "'-2+3"],
    ['@cmd', "'@cmd"],
    ['\tx', "'\tx"],
  ])('prefixes %j with an apostrophe', (cell, written) => {
    expect(csvField(cell)).toBe(written);
  });

  it('quotes a guarded cell that also holds a comma, quote or line break, apostrophe inside the quotes', () => {
    expect(csvField('=HYPERLINK("x"),1')).toBe(`"'=HYPERLINK(""x""),1"`);
    expect(csvField('\rline')).toBe(`"'\rline"`);
  });

  it('leaves numbers alone, so negative values stay numeric', () => {
    expect(csvField(-12)).toBe('-12');
    expect(csvField('a=b')).toBe('a=b');
  });
});

describe('bad CSV input', () => {
  it('names the row and column of a value that cannot be written', () => {
    const rows = [
      { name: 'Press', extra: 1 },
      { name: 'Test', extra: { nested: true } },
    ] as unknown as Array<{ name: string; extra: number }>;
    expect(() =>
      toCsv(rows, [
        { header: 'Name', key: 'name' },
        { header: 'Extra', key: 'extra' },
      ]),
    ).toThrow(
      new CsvError(
        'rows[1].extra',
        'cannot be written to CSV: expected text, a number, a boolean or a date, got object',
      ),
    );
  });

  it('refuses an empty column list and an invalid date', () => {
    expect(() => toCsv([{}], [])).toThrow('columns: at least one column is needed');
    expect(() => toCsv([{ at: new Date(Number.NaN) }], [{ header: 'At', key: 'at' }])).toThrow(
      'rows[0].at: is an invalid date',
    );
  });

  it('takes arrays as rows with getter columns', () => {
    const rows: Array<[string, number]> = [
      ['Press', 9],
      ['Leak, test', 8.4],
    ];
    expect(
      toCsv(rows, [
        { header: 'Step', key: 0 },
        { header: 'Cycle (s)', get: (row) => row[1] },
      ]),
    ).toBe('Step,Cycle (s)\r\nPress,9\r\n"Leak, test",8.4\r\n');
  });
});
