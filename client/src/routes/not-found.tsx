import { Link } from 'react-router';
import { paths } from '../config/paths';

export function NotFoundPage() {
  return (
    <div className="py-16 text-center">
      <h1 className="text-3xl">Nothing here</h1>
      <p className="mt-2 text-ink-soft">That address does not lead to a page of Mendery.</p>
      <Link to={paths.home()} className="mt-6 inline-block font-bold text-copper-dark underline">
        Back to the start
      </Link>
    </div>
  );
}
