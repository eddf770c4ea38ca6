// Saves a table as CSV; a failure to write the file is said beside the button.
import { useState } from 'react';
import { downloadCsv, type CsvColumn } from '../../../lib/export';

interface CsvButtonProps<T> {
  /** What the table holds, for the button's accessible name. */
  what: string;
  fileBase: string;
  rows: readonly T[];
  columns: readonly CsvColumn<T>[];
  label?: string;
}

export function CsvButton<T>({ what, fileBase, rows, columns, label = 'CSV' }: CsvButtonProps<T>) {
  const [problem, setProblem] = useState<string | null>(null);
  const save = () => {
    setProblem(null);
    try {
      downloadCsv(fileBase, rows, columns);
    } catch (error) {
      setProblem(error instanceof Error ? error.message : String(error));
    }
  };
  return (
    <span className="inline-flex flex-col items-end gap-1">
      <button
        type="button"
        aria-label={`Save ${what} as CSV`}
        onClick={save}
        className="rounded border border-ink-faint/50 bg-paper-raised px-2 py-1 text-xs font-medium text-ink-soft hover:border-accent hover:text-accent focus-visible:outline-2 focus-visible:outline-accent"
      >
        {label}
      </button>
      {problem && (
        <span role="alert" className="rounded bg-danger-soft px-2 py-1 text-xs text-danger">
          Export failed: {problem}
        </span>
      )}
    </span>
  );
}
