// The banner above a form for a failed submit that no single field explains.
import { ErrorBanner } from './ui/error-banner';
import type { SubmitFailure } from '../lib/use-api-form-submit';

export function FormErrorBanner({ failure, title }: { failure: SubmitFailure | null; title: string }) {
  if (!failure) return null;
  return (
    <ErrorBanner title={title}>
      <p>{failure.message}</p>
      {failure.issues.length > 0 && (
        <ul className="mt-1 list-disc pl-5">
          {failure.issues.map((issue) => (
            <li key={`${issue.path}:${issue.message}`}>
              {issue.path ? <code className="font-mono text-xs">{issue.path}</code> : null}
              {issue.path ? ': ' : null}
              {issue.message}
            </li>
          ))}
        </ul>
      )}
    </ErrorBanner>
  );
}
