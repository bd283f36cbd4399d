import { isRouteErrorResponse, Link, useRouteError } from 'react-router-dom';
import { NotFoundPage } from './not-found-page';

/** Each route's error boundary: a broken screen says so and offers a way out, the rest of the app lives on. */
export function RouteError() {
  const error = useRouteError();
  if (isRouteErrorResponse(error) && error.status === 404) return <NotFoundPage />;
  return (
    <div role="alert" className="py-12">
      <h1 className="font-display text-3xl uppercase">This screen broke</h1>
      <p className="mt-2 text-graphite">Something went wrong while showing it. Your saved work is safe.</p>
      <div className="mt-6 flex gap-4">
        <button type="button" className="underline underline-offset-4" onClick={() => window.location.reload()}>
          Reload
        </button>
        <Link to="/" reloadDocument className="underline underline-offset-4">Home</Link>
      </div>
    </div>
  );
}
