// What happened to the last save, said plainly; problems name their station and field, and a conflict offers to
// keep the user's work on top of the revision someone else saved.
import { Link } from 'react-router-dom';
import { Button } from '../../../../components/ui/button';
import { ErrorBanner } from '../../../../components/ui/error-banner';
import type { SaveOutcome } from '../hooks/use-save-draft';
import { displayPath, type PathIssue } from '../utils/paths';

/** Names the station and field of a dotted form path, from the draft being saved. */
type DescribePath = (formPath: string) => string;

function IssueList({
  issues,
  describe,
  onShow,
}: {
  issues: PathIssue[];
  describe: DescribePath;
  onShow: (formPath: string) => void;
}) {
  const shown = issues.slice(0, 12);
  return (
    <ul className="mt-1 list-disc pl-5" data-issue-list>
      {shown.map((issue) => (
        <li key={`${issue.path}:${issue.message}`} data-issue-path={displayPath(issue.path)}>
          {describe(issue.path)}: {issue.message}{' '}
          {issue.path !== '' && (
            <button
              type="button"
              className="text-sm font-semibold text-accent-strong underline underline-offset-4"
              onClick={() => onShow(issue.path)}
            >
              Show the field
            </button>
          )}
        </li>
      ))}
      {issues.length > shown.length && <li>and {issues.length - shown.length} more, marked in the editor</li>}
    </ul>
  );
}

interface SaveOutcomeProps {
  outcome: SaveOutcome | null;
  scenarioId: string;
  onKeepMine: () => void;
  rebasing: boolean;
  describe: DescribePath;
  onShow: (formPath: string) => void;
}

export function SaveOutcomeMessage({ outcome, scenarioId, onKeepMine, rebasing, describe, onShow }: SaveOutcomeProps) {
  if (!outcome) return null;
  switch (outcome.kind) {
    case 'saved':
      return (
        <p role="status" className="text-sm font-medium text-accent-strong">
          Saved as revision {outcome.number}.
        </p>
      );
    case 'invalid':
      return (
        <ErrorBanner
          title={`Not saved: ${outcome.issues.length} problem${outcome.issues.length === 1 ? '' : 's'} to fix first`}
        >
          <p>Each is marked beside its field; the section list shows where they are. Nothing you typed is lost.</p>
          <IssueList issues={outcome.issues} describe={describe} onShow={onShow} />
        </ErrorBanner>
      );
    case 'rejected':
      return (
        <ErrorBanner title="The server did not accept this revision">
          <p>{outcome.message} Your draft is unchanged.</p>
          <IssueList issues={outcome.issues} describe={describe} onShow={onShow} />
        </ErrorBanner>
      );
    case 'conflict': {
      const latestNumber = /revision (\d+)/.exec(outcome.message)?.[1];
      return (
        <ErrorBanner
          title="Someone else saved this scenario while you were editing"
          action={
            <div className="flex flex-wrap items-center gap-3">
              <Button onClick={onKeepMine} pending={rebasing} pendingLabel="Loading the latest revision…">
                Keep my changes on top of the latest revision
              </Button>
              {latestNumber !== undefined && (
                <Link
                  to={`/scenarios/${scenarioId}/revisions/${latestNumber}`}
                  className="text-sm font-semibold text-accent-strong underline underline-offset-4"
                >
                  See revision {latestNumber}
                </Link>
              )}
            </div>
          }
        >
          <p>{outcome.message}</p>
          <p>
            Your draft is kept as it is. Putting it on top makes the latest revision its base; then check it and save
            again.
          </p>
        </ErrorBanner>
      );
    }
    case 'failed':
      return (
        <ErrorBanner title="The revision was not saved">
          <p>{outcome.message} Your draft is unchanged; try again.</p>
        </ErrorBanner>
      );
  }
}
