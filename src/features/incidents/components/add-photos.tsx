import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { PhotoPicker } from '../../../components/photos/photo-picker';
import { useAddIncidentPhotos } from '../api/use-incident-mutations';

export function AddPhotos({ incidentId }: { incidentId: number }) {
  const add = useAddIncidentPhotos(incidentId);
  const toast = useToast();
  const [ids, setIds] = useState<number[]>([]);
  const [busy, setBusy] = useState(false);
  const [round, setRound] = useState(0);

  return (
    <div className="no-print mt-4 flex flex-col gap-3">
      <PhotoPicker key={round} label="Add photos" onChange={setIds} onBusyChange={setBusy} />
      {ids.length > 0 && (
        <div>
          <Button
            pending={add.isPending}
            disabled={busy}
            onClick={() =>
              add.mutate(
                { photoIds: ids },
                {
                  onSuccess: () => {
                    toast.success('Photos attached.');
                    setRound((r) => r + 1);
                  },
                  onError: (error) => toast.error(errorMessage(error)),
                },
              )
            }
          >
            Attach {ids.length === 1 ? 'photo' : `${ids.length} photos`}
          </Button>
        </div>
      )}
    </div>
  );
}
