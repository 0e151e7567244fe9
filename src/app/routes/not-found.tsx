import { Link } from 'react-router';
import { EmptyState } from '@/components/ui/empty-state';
import { paths } from '@/config/paths';

export function NotFoundRoute() {
  return (
    <div className="px-4 py-10">
      <title>Not found · Clearwood</title>
      <EmptyState title="We couldn't find that page">
        <Link to={paths.home.href()} className="underline underline-offset-4">
          Go to your trees
        </Link>
      </EmptyState>
    </div>
  );
}
