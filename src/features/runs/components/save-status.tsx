// What happened to a finished run's result: being saved, saved (with the way to its page), or not
// saved yet with a retry that sends the very same run again.
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { ErrorBanner } from '../../../components/ui/error-banner';
import { Spinner } from '../../../components/ui/spinner';
import type { SaveState } from '../hooks/use-run-and-save';

export function SaveStatus({ save, onRetry }: { save: SaveState; onRetry: () => void }) {
  switch (save.status) {
    case 'saving':
      return <Spinner label="Saving the run…" />;
    case 'failed':
      return (
        <ErrorBanner
          title="The run finished but is not saved yet"
          action={
            <Button variant="secondary" className="self-start" onClick={onRetry}>
              Save again
            </Button>
          }
        >
          {save.error instanceof Error ? save.error.message : 'Something unexpected went wrong.'} The result is kept on
          this page until it is saved; saving again cannot store it twice.
        </ErrorBanner>
      );
    case 'saved':
      return (
        <p role="status" className="text-sm text-ink">
          Saved as “{save.run.name}”.{' '}
          <Link className="font-semibold text-accent-strong underline underline-offset-4" to={`/runs/${save.run.id}`}>
            Open the results
          </Link>
        </p>
      );
    default:
      return null;
  }
}
