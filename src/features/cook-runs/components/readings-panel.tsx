import { useQuery } from '@tanstack/react-query';
import { useId, useState, type FormEvent } from 'react';
import {
  readingCelsiusHeaders,
  logPlacementLabels,
  readingMinuteHeaders,
  type CookRunDetailDto,
} from '../../../../shared/schemas/cook-runs';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Notice } from '../../../components/ui/notice';
import { Select } from '../../../components/ui/select';
import { useToast } from '../../../components/ui/toast';
import { ApiError, errorMessage } from '../../../lib/api-client';
import { cookRunsQueries } from '../api/cook-runs-queries';
import { useRemoveReadings } from '../api/use-remove-readings';
import { useUploadReadings } from '../api/use-upload-readings';
import { PlainTableHead } from '../../../components/ui/table/table-parts';

const shownRows = 40;
const placementOptions = [
  { value: 'chamber', label: 'In the chamber, or not known' },
  { value: 'centre', label: 'At the centre of a jar' },
];

export function ReadingsPanel({ run, canWrite }: { run: CookRunDetailDto; canWrite: boolean }) {
  const fileId = useId();
  const [progress, setProgress] = useState<number | null>(null);
  const [confirmRemove, setConfirmRemove] = useState(false);
  const [showAll, setShowAll] = useState(false);
  const uploadLog = useUploadReadings(run.id);
  const removeLog = useRemoveReadings(run.id);
  const readings = useQuery({ ...cookRunsQueries.readings(run.id), enabled: run.readingsCount > 0 });
  const toast = useToast();

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const form = event.currentTarget;
    const data = new FormData(form);
    const file = data.get('file');
    if (!(file instanceof File) || file.size === 0) return;
    const placement = data.get('placement') === 'centre' ? 'centre' : 'chamber';
    setProgress(0);
    uploadLog.mutate(
      { file, placement, onProgress: setProgress },
      {
        onSuccess: (updated) => {
          toast.success(`Log stored: ${updated.readingsCount} readings, F0 ${updated.f0?.toFixed(1) ?? '—'}.`);
          form.reset();
        },
        onSettled: () => setProgress(null),
      },
    );
  };

  const lineErrors = uploadLog.error instanceof ApiError ? uploadLog.error.issues : [];
  const rows = readings.data?.readings ?? [];

  return (
    <section aria-labelledby={`${fileId}-title`} className="rounded-lg border border-line bg-surface-raised p-4">
      <h2 id={`${fileId}-title`} className="text-lg font-semibold">
        Temperature log
      </h2>
      <p className="mt-1 text-muted">
        {run.readingsCount > 0
          ? `${run.readingsCount} readings from a ${run.logPlacement ? logPlacementLabels[run.logPlacement] : 'probe'}. F0 is summed from them (z = 10 °C, reference 121.1 °C).`
          : 'No log yet, so F0 is the estimated upper bound. A probe log from the jar centre gives the real figure.'}
      </p>

      {canWrite && (
        <form onSubmit={submit} className="no-print mt-4 flex flex-col gap-3">
          <label htmlFor={fileId} className="font-medium">
            {run.readingsCount > 0 ? 'Replace the log' : 'Upload a log'} (CSV)
          </label>
          <p className="text-sm text-muted">
            Two columns: elapsed minutes ({readingMinuteHeaders.join(', ')}) and °C ({readingCelsiusHeaders.join(', ')}
            ). A new file replaces the whole log.
          </p>
          <Select
            name="placement"
            label="Where the probe sat"
            hint="Only a probe at the centre of a jar measures what the grain received; a chamber log cannot pass a run."
            options={placementOptions}
            defaultValue="chamber"
          />
          <input
            id={fileId}
            name="file"
            type="file"
            accept=".csv,text/csv,text/plain"
            required
            className="max-w-full"
          />
          {progress !== null && (
            <progress value={progress} max={1} className="w-full" aria-label="Upload progress">
              {Math.round(progress * 100)} %
            </progress>
          )}
          <div>
            <Button type="submit" pending={uploadLog.isPending}>
              Upload log
            </Button>
          </div>
        </form>
      )}

      <div role="alert" className="mt-3">
        {uploadLog.error && (
          <Notice tone="danger" title={errorMessage(uploadLog.error)}>
            {lineErrors.length > 0 && (
              <ul className="list-disc space-y-0.5 pl-5 text-sm">
                {lineErrors.map((issue) => (
                  <li key={issue.message}>{issue.message}</li>
                ))}
              </ul>
            )}
          </Notice>
        )}
      </div>

      {rows.length > 0 && (
        <div className="mt-4">
          <table className="w-full max-w-md border-collapse text-left text-sm tabular-nums">
            <caption className="sr-only">Readings</caption>
            <thead>
              <PlainTableHead
                headings={['Minute', '°C', { label: 'Lethal rate', className: 'py-1' }]}
                cellClassName="py-1 pr-4"
                rowClassName="border-b border-line"
              />
            </thead>
            <tbody>
              {(showAll ? rows : rows.slice(0, shownRows)).map((r) => (
                <tr key={r.minute} className="border-b border-line/60">
                  <td className="py-1 pr-4">{r.minute}</td>
                  <td className="py-1 pr-4">{r.celsius.toFixed(1)}</td>
                  <td className="py-1">{r.lethalRate.toFixed(4)}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <div className="no-print mt-3 flex flex-wrap gap-3">
            {rows.length > shownRows && (
              <Button variant="ghost" onClick={() => setShowAll((v) => !v)}>
                {showAll ? 'Show fewer' : `Show all ${rows.length}`}
              </Button>
            )}
            {canWrite && (
              <Button variant="ghost" className="text-danger" onClick={() => setConfirmRemove(true)}>
                Remove log
              </Button>
            )}
          </div>
        </div>
      )}

      <ConfirmDialog
        open={confirmRemove}
        onClose={() => {
          removeLog.reset();
          setConfirmRemove(false);
        }}
        onConfirm={() =>
          removeLog.mutate(undefined, {
            onSuccess: () => {
              toast.success('Log removed; F0 is the estimate again.');
              setConfirmRemove(false);
            },
          })
        }
        pending={removeLog.isPending}
        error={removeLog.error ? errorMessage(removeLog.error) : undefined}
        title="Remove the temperature log?"
        confirmLabel="Remove log"
      >
        <p>The readings are deleted and F0 goes back to the estimated upper bound. The audit trail keeps the change.</p>
      </ConfirmDialog>
    </section>
  );
}
