import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { StepLinkDto } from '../../../../shared/schemas/procedures';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { proceduresQueries } from '../api/procedures-queries';
import { useUnlinkStep } from '../api/use-link-step';

/** The incidents linked to a step, each a link, with unlinking for those who may change links. */
export function StepLinksList({ stepId, canLink }: { stepId: number; canLink: boolean }) {
  const links = useQuery(proceduresQueries.linksOfStep(stepId));
  const unlink = useUnlinkStep();
  const [removing, setRemoving] = useState<StepLinkDto | null>(null);
  const items = links.data?.items ?? [];
  if (items.length === 0) return null;
  return (
    <>
      <ul aria-label="Linked incidents" className="mt-2 flex flex-col gap-1 text-sm">
        {items.map((l) => (
          <li key={l.id} className="flex flex-wrap items-center gap-x-3">
            <Link to={paths.incident.to(l.incidentId)} className="font-semibold text-accent underline">
              Incident #{l.incidentId}
            </Link>
            <span className="text-muted">
              {l.note ?? ''} — {l.linkedByName}
            </span>
            {canLink && (
              <Button variant="ghost" onClick={() => setRemoving(l)}>
                Unlink #{l.incidentId}
              </Button>
            )}
          </li>
        ))}
      </ul>
      <ConfirmDialog
        open={removing !== null}
        onClose={() => setRemoving(null)}
        onConfirm={() => removing && unlink.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
        title={removing ? `Unlink incident #${removing.incidentId}?` : 'Unlink'}
        confirmLabel="Unlink"
        tone="danger"
        pending={unlink.isPending}
        error={unlink.error ? errorMessage(unlink.error) : undefined}
      >
        The link is removed from this step; the incident’s history keeps a record that it was linked and unlinked.
      </ConfirmDialog>
    </>
  );
}
