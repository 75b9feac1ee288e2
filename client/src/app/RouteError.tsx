import { isRouteErrorResponse, useRouteError } from 'react-router-dom';
import { Button } from '../shared/components/Button';
import { NotFoundNotice } from '../shared/components/NotFoundNotice';

/*
 * What a page shows when its code fails to load or throws while rendering. The message
 * is the error's own, never a stack. A failed code download usually means a new version
 * was deployed since the page was opened, so reloading is the remedy offered.
 */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundNotice />;
  const message = error instanceof Error ? error.message : 'An unexpected error occurred.';
  return (
    <section
      role="alert"
      aria-labelledby="route-error-title"
      className="mx-auto flex max-w-xl flex-col items-start gap-4 px-4 py-12"
    >
      <title>Something went wrong · Seedwake</title>
      <p className="font-mono text-sm tracking-wide text-danger-700">error</p>
      <h1 id="route-error-title" className="text-4xl font-semibold">
        This page could not be shown
      </h1>
      <p className="text-lg text-loam-700">
        Nothing you saved is lost. Reloading usually fixes it; if not, try again later.
      </p>
      <p className="rounded-seed bg-silt-100 px-3 py-2 font-mono text-sm break-words text-humus-900">
        {message}
      </p>
      <Button onClick={() => window.location.reload()}>Reload the page</Button>
    </section>
  );
}
