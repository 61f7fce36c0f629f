import { useState } from 'react';
import { Link, useNavigate } from 'react-router';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { sendPhotosTo, type PhotoToSend } from '../flag-outbox';

interface Props {
  incident: { id: number; foundOn: string; label: string };
  files: PhotoToSend[];
  blocked: boolean;
}

/** A second flag of the same jar is most often a second look: its photos belong to the open incident. */
export function OpenIncidentNotice({ incident, files, blocked }: Props) {
  const navigate = useNavigate();
  const toast = useToast();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string>();

  const add = async () => {
    setPending(true);
    setError(undefined);
    try {
      const outcome = await sendPhotosTo(incident.id, files);
      toast.success(
        outcome.sent
          ? `Photos added to incident ${incident.id}.`
          : `No connection: the photos for incident ${incident.id} are kept on this phone and send themselves later.`,
      );
      void navigate(outcome.sent ? paths.incident.to(incident.id) : paths.outbox.to());
    } catch (e) {
      setError(errorMessage(e));
    } finally {
      setPending(false);
    }
  };

  return (
    <Notice tone="warn" title={`${incident.label} already has an open incident`}>
      <p>
        <Link className="text-accent underline" to={paths.incident.to(incident.id)}>
          Incident {incident.id}
        </Link>{' '}
        was flagged on {formatDate(incident.foundOn)}. Add your photos to it instead of flagging the jar again.
      </p>
      {error && <p className="mt-1 text-sm font-medium text-danger">{error}</p>}
      <Button
        variant="secondary"
        className="mt-2 w-full"
        pending={pending}
        disabled={files.length === 0 || blocked}
        onClick={() => void add()}
      >
        {files.length
          ? `Add ${files.length} photo${files.length > 1 ? 's' : ''} to incident ${incident.id}`
          : 'Take a photo to add it'}
      </Button>
    </Notice>
  );
}
