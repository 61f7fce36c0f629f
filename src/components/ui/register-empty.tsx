import { Button } from './button';
import { EmptyState } from './empty-state';

interface RegisterEmptyProps {
  filtered: boolean;
  /** Shown when the register holds nothing at all. */
  none: string;
  /** Shown when filters hide every row. */
  noMatch: string;
  onClear?: () => void;
}

export function RegisterEmpty({ filtered, none, noMatch, onClear }: RegisterEmptyProps) {
  if (!filtered) return <EmptyState title={none} />;
  return (
    <EmptyState
      icon="search"
      title={noMatch}
      action={
        onClear && (
          <Button variant="secondary" onClick={onClear}>
            Clear filters
          </Button>
        )
      }
    />
  );
}
