import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { paths } from '../paths';

/** Shown when a page fails to load or render; offers a way back instead of a blank screen. */
export function RouteError() {
  const error = useRouteError();
  const message = isRouteErrorResponse(error) ? `${error.status} ${error.statusText}` : error instanceof Error ? error.message : 'Unknown error';
  return (
    <main className="mx-auto max-w-xl p-8">
      <h1 className="text-xl font-semibold">This page could not be shown</h1>
      <p className="mt-2 text-ink-soft">{message}</p>
      <p className="mt-4 flex gap-4">
        <button type="button" className="text-spruce-700 underline" onClick={() => window.location.reload()}>
          Reload the page
        </button>
        <Link className="text-spruce-700 underline" to={paths.home.to()}>
          Go to the start page
        </Link>
      </p>
    </main>
  );
}
