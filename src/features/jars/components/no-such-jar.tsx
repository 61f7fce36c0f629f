import { useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { TextInput } from '../../../components/ui/text-input';
import { paths } from '../../../config/paths';

/** A stale or mistyped QR address: say which label is unknown and offer to look for the jar. */
export function NoSuchJar({ label }: { label: string }) {
  const navigate = useNavigate();
  return (
    <EmptyState titleAs="h1" icon="search" title={`No jar is labelled ${label}.`}>
      <p>The label may be worn, mistyped or from another lab. Search the jars for part of it:</p>
      <form
        className="mt-4 flex items-end gap-2 text-left"
        role="search"
        onSubmit={(e) => {
          e.preventDefault();
          const q = new FormData(e.currentTarget).get('q');
          if (typeof q === 'string' && q.trim()) void navigate(paths.jars.to({ q: q.trim() }));
        }}
      >
        <TextInput label="Search jars" name="q" defaultValue={label} autoComplete="off" spellCheck={false} />
        <Button type="submit">Search</Button>
      </form>
    </EmptyState>
  );
}
