// Shown in place of a page that failed to render or load, inside the normal
// frame so the header, sign-out and safety note stay. A page's code chunk can
// go missing after an upgrade; reloading fetches the new one.
import { useRouteError } from 'react-router-dom';
import { Button, ButtonLink } from '../../components/ui/button';
import { ErrorBanner } from '../../components/ui/error-banner';

export function RouteError() {
  const error = useRouteError();
  const detail = error instanceof Error ? error.message : 'An unexpected problem stopped this page.';
  return (
    <ErrorBanner
      title="This page could not be shown."
      action={
        <div className="flex flex-wrap gap-3">
          <Button variant="secondary" onClick={() => window.location.reload()}>
            Reload the page
          </Button>
          <ButtonLink to="/">Go to your projects</ButtonLink>
        </div>
      }
    >
      <p>{detail}</p>
    </ErrorBanner>
  );
}
