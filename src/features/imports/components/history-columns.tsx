import { contaminantNames, contaminants } from '../../../../shared/enums';
import { historyColumns, optionalHistoryColumns, type HistoryColumn } from '../../../../shared/schemas/imports';
import { PlainTableHead } from '../../../components/ui/table/table-parts';

const meaning: Record<HistoryColumn, string> = {
  jar_label: 'The jar or bag label. Unique: a label already in Asepta, or twice in the file, is refused.',
  grain: 'A grain on the lab’s grain list, by name, in any case.',
  cook_run: 'The cook run code. A code Asepta does not know yet creates the run.',
  cook_minutes: 'Whole minutes at pressure. Every row of one cook run gives the same number.',
  inoculated_on: 'The date the jar was inoculated, written YYYY-MM-DD.',
  session: 'The inoculation session code. Every row of one session gives the same date and operator.',
  operator: 'A user’s username or name links the session to that account; any other name is kept as a staff name.',
  culture: 'The culture code. A new code creates the culture, recorded as released.',
  outcome: 'clean or contaminated.',
  contaminant: 'When contaminated: a code or name from the list below. Leave empty for clean jars.',
  found_on: 'When contaminated: the date it was found, YYYY-MM-DD, not before inoculated_on.',
};

const example: Record<HistoryColumn, string>[] = [
  {
    jar_label: 'J00412',
    grain: 'rye',
    cook_run: 'CR-2590',
    cook_minutes: '90',
    inoculated_on: '2026-03-02',
    session: 'IS-260302-A',
    operator: 'Noor Halvey',
    culture: 'LC-0925',
    outcome: 'clean',
    contaminant: '',
    found_on: '',
  },
  {
    jar_label: 'J00413',
    grain: 'brown rice',
    cook_run: 'CR-2590',
    cook_minutes: '90',
    inoculated_on: '2026-03-02',
    session: 'IS-260302-A',
    operator: 'Noor Halvey',
    culture: 'LC-0925',
    outcome: 'contaminated',
    contaminant: 'green mould',
    found_on: '2026-03-11',
  },
];

const contaminantList = contaminants.map((c) => `${c} (${contaminantNames[c]})`).join('; ');

export function HistoryColumns() {
  const sample = [historyColumns.join(','), ...example.map((r) => historyColumns.map((c) => r[c]).join(','))].join(
    '\n',
  );
  return (
    <section aria-labelledby="history-columns-title" className="rounded-lg border border-line bg-surface-raised p-4">
      <h2 id="history-columns-title" className="text-lg font-semibold">
        What the file holds
      </h2>
      <p className="mt-1 max-w-prose text-muted">
        A CSV file saved as UTF-8, one jar per line, up to 10 MB. The first line names the columns, in any order and any
        case. Other columns are skipped and listed after the import. The whole file is imported, or nothing is.
      </p>
      <div className="mt-4 overflow-x-auto">
        <table className="w-full border-collapse text-left text-sm">
          <caption className="sr-only">Columns of the history file</caption>
          <thead>
            <PlainTableHead
              headings={['Column', 'What goes in it', { label: 'Example', className: 'py-2' }]}
              cellClassName="py-2 pr-4"
              rowClassName="border-b border-line"
            />
          </thead>
          <tbody>
            {historyColumns.map((c) => (
              <tr key={c} className="border-b border-line align-top">
                <th scope="row" className="py-2 pr-4 font-mono font-medium whitespace-nowrap">
                  {c}
                  {optionalHistoryColumns.includes(c) && (
                    <span className="block font-sans text-xs text-muted">may be left out when every jar is clean</span>
                  )}
                </th>
                <td className="py-2 pr-4">{meaning[c]}</td>
                <td className="py-2 font-mono whitespace-nowrap">{example[1]?.[c]}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p className="mt-3 text-sm text-muted">Contaminants: {contaminantList}.</p>
      <p className="mt-3 text-sm font-medium">Two example lines</p>
      {/* A scrolling sample must take focus so a keyboard can scroll it. */}
      <pre
        // eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex -- a scrolling sample must take keyboard focus
        tabIndex={0}
        role="region"
        aria-label="Sample file"
        className="mt-1 overflow-x-auto rounded-md bg-surface-sunken p-3 text-sm"
      >
        {sample}
      </pre>
    </section>
  );
}
