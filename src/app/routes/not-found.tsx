import { Link } from 'react-router-dom';

export function NotFoundPage() {
  return (
    <div className="py-16 text-center">
      <h1 className="mb-2 text-2xl font-semibold">No such page</h1>
      <Link className="text-accent underline" to="/counter">
        Back to the Counter
      </Link>
    </div>
  );
}
