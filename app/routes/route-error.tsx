// Shown when a page fails while rendering: says so plainly and offers a way back.
import { isRouteErrorResponse, Link, useRouteError } from 'react-router';
import { buttonClasses } from '../components/ui/button';
import { useDocumentTitle } from '../hooks/use-document-title';

export function RouteError() {
  useDocumentTitle('Something went wrong');
  const error = useRouteError();
  const detail = isRouteErrorResponse(error)
    ? `${error.status} ${error.statusText}`
    : error instanceof Error
      ? error.message
      : 'Unknown error';
  return (
    <main className="mx-auto max-w-2xl space-y-4 px-4 py-16">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="text-stone-700">
        This page could not be shown. Reloading often helps; if it keeps happening, tell your site
        administrator what you were doing.
      </p>
      <pre className="overflow-x-auto rounded-md border border-stone-200 bg-white p-3 text-sm text-stone-800">
        {detail}
      </pre>
      <div className="flex gap-2">
        <button
          type="button"
          className={buttonClasses('primary')}
          onClick={() => window.location.reload()}
        >
          Reload the page
        </button>
        <Link to="/" className={buttonClasses('secondary')}>
          Go to your projects
        </Link>
      </div>
    </main>
  );
}
