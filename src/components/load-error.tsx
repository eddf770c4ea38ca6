// What a page shows when its data could not be loaded: a readable reason and a retry.
import { isApiRequestError } from '../lib/api-client';
import { Button } from './ui/button';
import { ErrorBanner } from './ui/error-banner';

interface LoadErrorProps {
  what: string;
  error: unknown;
  onRetry?: () => void;
}

export function LoadError({ what, error, onRetry }: LoadErrorProps) {
  const message =
    isApiRequestError(error) || error instanceof Error ? error.message : 'Something unexpected went wrong.';
  return (
    <ErrorBanner
      title={`Could not load ${what}.`}
      action={
        onRetry && (
          <Button variant="secondary" className="self-start" onClick={onRetry}>
            Try again
          </Button>
        )
      }
    >
      {message}
    </ErrorBanner>
  );
}
