import { Link } from 'react-router-dom';

export function NotFoundPage() {
  return (
    <div className="py-12">
      <p className="font-display text-7xl text-signal">404</p>
      <h1 className="mt-2 font-display text-3xl uppercase">Nothing parked here</h1>
      <p className="mt-2 text-graphite">The page you asked for does not exist, or it moved.</p>
      <Link to="/" reloadDocument className="mt-6 inline-block underline underline-offset-4">Back to the home page</Link>
    </div>
  );
}
