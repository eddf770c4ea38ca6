// Scenario JSON out and in. Export writes the draft when it is valid (else the saved revision);
// import checks the file with the shared schema, lists every problem with its path, and a valid file
// becomes the draft without being saved.
import { useId, useRef, useState } from 'react';
import type { Scenario } from '../../../../../shared/scenario/scenario';
import { Button } from '../../../../components/ui/button';
import { ErrorBanner } from '../../../../components/ui/error-banner';
import { downloadScenario, readScenarioFile } from '../utils/import-export';
import type { PathIssue } from '../utils/paths';

interface ImportExportProps {
  /** The document to export; null when there is none to offer. */
  exportDocument: () => { document: Scenario; revisionNumber?: number } | null;
  onImported?: (document: Scenario) => void;
}

export function ImportExport({ exportDocument, onImported }: ImportExportProps) {
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [problem, setProblem] = useState<{ file: string; issues: PathIssue[] } | null>(null);
  const [imported, setImported] = useState<string | null>(null);

  const onFile = async (file: File | undefined) => {
    if (!file || !onImported) return;
    setImported(null);
    const outcome = await readScenarioFile(file);
    if (input.current) input.current.value = '';
    if (!outcome.ok) {
      setProblem({ file: file.name, issues: outcome.issues });
      return;
    }
    setProblem(null);
    setImported(file.name);
    onImported(outcome.document);
  };
  const onExport = () => {
    const what = exportDocument();
    if (what) downloadScenario(what.document, what.revisionNumber);
  };

  return (
    <div className="flex flex-col gap-2">
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" onClick={onExport}>
          Export JSON
        </Button>
        {onImported && (
          <>
            <label htmlFor={inputId} className="sr-only">
              Import scenario JSON
            </label>
            <input
              ref={input}
              id={inputId}
              type="file"
              accept="application/json,.json"
              className="sr-only"
              onChange={(e) => void onFile(e.target.files?.[0])}
            />
            <Button variant="secondary" onClick={() => input.current?.click()}>
              Import JSON…
            </Button>
          </>
        )}
      </div>
      {imported && (
        <p role="status" className="text-sm text-accent-strong">
          {imported} is now the draft. Check it, then save to make it a revision.
        </p>
      )}
      {problem && (
        <ErrorBanner
          title={`${problem.file} was not imported: ${problem.issues.length} problem${problem.issues.length === 1 ? '' : 's'}`}
        >
          <ul className="list-disc pl-5" data-import-issues>
            {problem.issues.slice(0, 50).map((issue) => (
              <li key={`${issue.path}:${issue.message}`} data-issue-path={issue.path}>
                {issue.message}
              </li>
            ))}
            {problem.issues.length > 50 && <li>and {problem.issues.length - 50} more</li>}
          </ul>
        </ErrorBanner>
      )}
    </div>
  );
}
