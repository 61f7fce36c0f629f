import { useId, useState, type ChangeEvent, type FormEvent } from 'react';
import { historyMaxBytes } from '../../../../shared/schemas/imports';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { errorMessage } from '../../../lib/api-client';
import { useImportHistory } from '../api/use-import-history';
import { HistoryColumns } from './history-columns';
import { ImportResult } from './import-result';

const megabytes = (bytes: number) =>
  bytes < 1024 * 1024 ? `${Math.max(1, Math.round(bytes / 1024))} KB` : `${(bytes / 1024 / 1024).toFixed(1)} MB`;

export function HistoryImportScreen() {
  const inputId = useId();
  const [file, setFile] = useState<File | null>(null);
  const [progress, setProgress] = useState<number | null>(null);
  const importHistory = useImportHistory();
  const tooBig = file !== null && file.size > historyMaxBytes;

  const choose = (event: ChangeEvent<HTMLInputElement>) => {
    setFile(event.target.files?.[0] ?? null);
    importHistory.reset();
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (!file || tooBig) return;
    setProgress(0);
    importHistory.mutate({ file, onProgress: setProgress }, { onSettled: () => setProgress(null) });
  };

  const uploading = progress !== null && progress < 1;
  return (
    <>
      <PageHeader
        title="History import"
        description="Bring a lab’s past production into Asepta from a spreadsheet: one line per jar, with its cook run, session, culture and outcome. The analysis then reads it like any other record."
      />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1.2fr)]">
        <div className="space-y-4">
          <form onSubmit={submit} className="space-y-3 rounded-lg border border-line bg-surface-raised p-4">
            <label htmlFor={inputId} className="block text-lg font-semibold">
              History file (CSV)
            </label>
            <input
              id={inputId}
              name="file"
              type="file"
              accept=".csv,text/csv"
              onChange={choose}
              aria-describedby={`${inputId}-hint`}
              className="block max-w-full"
            />
            <p id={`${inputId}-hint`} className="text-sm text-muted">
              {file ? `${file.name}, ${megabytes(file.size)}` : 'Up to 10 MB. In a spreadsheet, save as “CSV UTF-8”.'}
            </p>
            {tooBig && (
              <p role="alert" className="text-sm font-medium text-danger">
                This file is {megabytes(file.size)}; the limit is 10 MB. Split it into several files by date.
              </p>
            )}
            {progress !== null && (
              <div className="space-y-1">
                <progress
                  value={uploading ? progress : undefined}
                  max={1}
                  className="w-full"
                  aria-label="Upload progress"
                >
                  {Math.round(progress * 100)} %
                </progress>
                <p className="text-sm text-muted" aria-live="polite">
                  {uploading ? `Uploading… ${Math.round(progress * 100)} %` : 'Checking every line and importing…'}
                </p>
              </div>
            )}
            <Button type="submit" icon="check" pending={importHistory.isPending} disabled={!file || tooBig}>
              Import
            </Button>
          </form>
          <div role="alert">
            {importHistory.error && <Notice tone="danger" title={errorMessage(importHistory.error)} />}
          </div>
          <div aria-live="polite">
            {importHistory.data && file && <ImportResult answer={importHistory.data} fileName={file.name} />}
          </div>
        </div>
        <HistoryColumns />
      </div>
    </>
  );
}
