import type { ImportError } from '../../../../shared/schemas/imports';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import type { HistoryImportAnswer } from '../api/send-history';
import { PlainTableHead } from '../../../components/ui/table/table-parts';
import { countOf } from '../../../lib/count-text';

/** A browser table of tens of thousands of rows helps no one; the rest go into the download. */
const shownErrors = 500;

function downloadErrors(errors: ImportError[], fileName: string) {
  const quote = (v: string) => (/[",\r\n]/.test(v) ? `"${v.replace(/"/g, '""')}"` : v);
  const text = [
    'line,column,message',
    ...errors.map((e) => [String(e.line), e.column, e.message].map(quote).join(',')),
  ].join('\r\n');
  const url = URL.createObjectURL(new Blob(['\uFEFF', text], { type: 'text/csv;charset=utf-8' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = `${fileName.replace(/\.csv$/i, '')}-problems.csv`;
  a.click();
  URL.revokeObjectURL(url);
}

export function ImportResult({ answer, fileName }: { answer: HistoryImportAnswer; fileName: string }) {
  if (answer.kind === 'imported') {
    const { jars, incidents } = answer.result.imported;
    const ignored = answer.result.ignoredColumns;
    return (
      <Notice
        tone="ok"
        title={`Imported ${countOf(jars, 'jar')} and ${countOf(incidents, 'incident')} from ${fileName}.`}
      >
        <p>
          Contaminated jars are filed as closed incidents with the verdict confirmed. Clean jars inoculated within the
          lab’s observation window count as still incubating.
        </p>
        {ignored.length > 0 ? (
          <p className="mt-2">
            Columns not imported: <span className="font-mono">{ignored.join(', ')}</span>
          </p>
        ) : (
          <p className="mt-2">Every column in the file was used.</p>
        )}
      </Notice>
    );
  }

  const { errors } = answer;
  return (
    <div className="space-y-4">
      <Notice
        tone="danger"
        title={`${fileName} has ${countOf(errors.length, 'problem')}. Nothing was imported.`}
        action={
          errors.length > shownErrors && (
            <Button variant="secondary" onClick={() => downloadErrors(errors, fileName)}>
              Download all {errors.length} as CSV
            </Button>
          )
        }
      >
        Correct these lines in the file and upload it again. Line 1 is the header line.
      </Notice>
      <div className="overflow-x-auto rounded-lg border border-line bg-surface-raised">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Problems found in the file, by line and column</caption>
          <thead>
            <PlainTableHead
              headings={[{ label: 'Line', className: 'px-3 py-2 text-right' }, 'Column', 'Problem']}
              cellClassName="px-3 py-2"
              rowClassName="border-b border-line bg-surface-sunken"
            />
          </thead>
          <tbody>
            {errors.slice(0, shownErrors).map((e, i) => (
              <tr key={`${e.line}-${e.column}-${i}`} className="border-b border-line align-top">
                <td className="px-3 py-2 text-right tabular-nums">{e.line}</td>
                <td className="px-3 py-2 font-mono">{e.column || '—'}</td>
                <td className="px-3 py-2">{e.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      {errors.length > shownErrors && (
        <p className="text-sm text-muted">
          The first {shownErrors} problems are shown; the download holds all {errors.length}.
        </p>
      )}
    </div>
  );
}
