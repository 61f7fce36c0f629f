import { EmptyState } from '../ui/empty-state';
import { StartPageLink } from './start-page-link';

export function NotFound() {
  return (
    <EmptyState titleAs="h1" icon="search" title="There is no screen at this address." action={<StartPageLink />}>
      The link may be mistyped, or the record it pointed to may have moved. Check the address, or start again from the
      start page.
    </EmptyState>
  );
}
