import { Link } from 'react-router-dom';
import { PageHeader } from '../../components/ui/page-header';
import { EmptyState } from '../../components/ui/empty-state';
import { buttonClasses } from '../../components/ui/button';

export function NotFoundRoute() {
  return (
    <>
      <PageHeader title="Page not found" />
      <EmptyState
        title="There is no page at this address."
        action={
          <Link to="/boms" className={buttonClasses('secondary')}>
            Go to BOMs
          </Link>
        }
      >
        It may have moved, or the link may be mistyped.
      </EmptyState>
    </>
  );
}
