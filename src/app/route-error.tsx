import { isRouteErrorResponse, useRouteError } from 'react-router-dom';

/** What a page that failed to load or render shows; after a new release an old page chunk is gone, so reloading is the cure. */
export function RouteError() {
  const error = useRouteError();
  const detail = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : error instanceof Error ? error.message : null;
  return (
    <main className="mx-auto max-w-xl px-4 py-16 text-center">
      <h1 className="mb-2 text-2xl font-semibold">This page could not be shown</h1>
      {detail && <p className="mb-4 text-ink-soft">{detail}</p>}
      <button type="button" className="text-accent underline" onClick={() => window.location.reload()}>
        Reload the page
      </button>
    </main>
  );
}
