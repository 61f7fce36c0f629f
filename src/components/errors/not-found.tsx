import { Link } from 'react-router';
import { paths } from '../../config/paths';
import { buttonClasses } from '../ui/button';
import { EmptyState } from '../ui/empty-state';

export function NotFound() {
  return (
    <EmptyState
      titleAs="h1"
      icon="search"
      title="There is no screen at this address."
      action={
        <Link to={paths.home.to()} className={buttonClasses('primary')}>
          Go to the start page
        </Link>
      }
    >
      The link may be mistyped, or the record it pointed to may have moved. Check the address, or start again from the
      start page.
    </EmptyState>
  );
}
