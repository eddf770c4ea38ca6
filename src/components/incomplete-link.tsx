// What a page opened from a mailed or shared link says when the secret after the # is missing or cut.
import { ErrorBanner } from './ui/error-banner';

export function IncompleteLink({ from = 'the e-mail' }: { from?: string }) {
  return (
    <ErrorBanner title="This link is incomplete">
      <p>Copy the whole address from {from}, including everything after the # sign.</p>
    </ErrorBanner>
  );
}
