// Any address that matches no page.
import { Link } from 'react-router';
import { buttonClasses } from '../components/ui/button';
import { useDocumentTitle } from '../hooks/use-document-title';

export function NotFoundRoute() {
  useDocumentTitle('Page not found');
  return (
    <section className="space-y-4 py-12">
      <h1 className="text-2xl font-semibold">Page not found</h1>
      <p className="text-stone-700">
        There is no page at this address. It may have moved, or the link may be mistyped.
      </p>
      <Link to="/" className={buttonClasses('primary')}>
        Go to your projects
      </Link>
    </section>
  );
}
