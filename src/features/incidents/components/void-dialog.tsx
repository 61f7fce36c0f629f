import { useState } from 'react';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useVoidIncident } from '../api/use-incident-mutations';
import { NotesField } from './notes-field';

interface VoidDialogProps {
  incidentId: number;
  version: number;
  open: boolean;
  onClose: () => void;
}

/** Incidents are never deleted: voiding keeps the record and its history, and stops its jars counting. */
export function VoidDialog({ incidentId, version, open, onClose }: VoidDialogProps) {
  const voidIncident = useVoidIncident(incidentId);
  const toast = useToast();
  const [reason, setReason] = useState('');
  const [tooShort, setTooShort] = useState(false);

  const confirm = () => {
    if (reason.trim().length < 3) return setTooShort(true);
    voidIncident.mutate(
      { reason: reason.trim(), version },
      {
        onSuccess: () => {
          toast.success(`Incident ${incidentId} voided.`);
          onClose();
        },
      },
    );
  };

  return (
    <ConfirmDialog
      open={open}
      onClose={onClose}
      onConfirm={confirm}
      title={`Void incident ${incidentId}?`}
      confirmLabel="Void incident"
      pending={voidIncident.isPending}
      error={voidIncident.error ? errorMessage(voidIncident.error) : undefined}
    >
      <p>
        The incident stays in the register and keeps its history, but its jars no longer count as contaminated and get
        back the status they had before. This cannot be undone.
      </p>
      <NotesField
        label="Reason"
        hint="For example: wrong jar scanned, entered twice."
        value={reason}
        error={tooShort ? 'give a reason of at least 3 characters' : undefined}
        onChange={(e) => {
          setReason(e.target.value);
          setTooShort(false);
        }}
      />
    </ConfirmDialog>
  );
}
