import { useQuery } from '@tanstack/react-query';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { jarQrUrl, jarsQueries } from '../api/jars-queries';
import { countOf } from '../../../lib/count-text';

export type LabelLayout = 'sheet' | 'roll';

interface Props {
  query: { sessionId?: number; ids?: string };
  layout: LabelLayout;
  onLayout: (layout: LabelLayout) => void;
}

// A4 sheet of 3 × 8 labels of 70 × 37 mm (common 24-up stock); roll of one 50 × 25 mm label per row.
const pageRules: Record<LabelLayout, string> = {
  sheet: '@page { size: A4; margin: 0; } .label-grid { padding: 0 !important; gap: 0 !important; }',
  roll: '@page { size: 50mm 25mm; margin: 0; } .label-cell { break-after: page; }',
};

export function LabelSheet({ query, layout, onLayout }: Props) {
  const labels = useQuery(jarsQueries.labels(query));
  if (labels.isPending) return <FullPageSpinner />;
  if (labels.error)
    return (
      <Notice tone="danger" title="The labels could not be loaded.">
        {errorMessage(labels.error)}
      </Notice>
    );
  const items = labels.data.items;

  return (
    <>
      <style>{`@media print { ${pageRules[layout]} }`}</style>
      <div className="no-print">
        <PageHeader
          title="Jar labels"
          description={`${countOf(items.length, 'label')}. Each QR code opens the jar’s page on any phone.`}
          actions={
            <>
              <fieldset className="flex gap-2">
                <legend className="sr-only">Layout</legend>
                {(['sheet', 'roll'] as const).map((l) => (
                  <Button
                    key={l}
                    variant={l === layout ? 'primary' : 'secondary'}
                    aria-pressed={l === layout}
                    onClick={() => onLayout(l)}
                  >
                    {l === 'sheet' ? 'A4 sheet, 3 × 8' : 'Narrow roll'}
                  </Button>
                ))}
              </fieldset>
              <Button onClick={() => window.print()}>Print</Button>
            </>
          }
        />
      </div>
      {items.length === 0 ? (
        <EmptyState title="No jars to label." />
      ) : (
        <div
          className={cx(
            'label-grid text-black',
            layout === 'sheet'
              ? 'grid grid-cols-3 gap-2 sm:w-[210mm] print:grid-cols-[repeat(3,70mm)] print:grid-rows-[repeat(8,37mm)]'
              : 'flex flex-col gap-2',
          )}
        >
          {items.map((l) => (
            <div
              key={l.id}
              className={cx(
                'label-cell flex items-center gap-2 overflow-hidden border border-dashed border-line bg-white print:border-0',
                layout === 'sheet' ? 'h-[37mm] p-[3mm]' : 'h-[25mm] w-[50mm] p-[1.5mm]',
              )}
            >
              <img
                src={jarQrUrl(l.qrPath)}
                alt={`QR code for ${l.label}`}
                className={layout === 'sheet' ? 'h-[30mm] w-[30mm]' : 'h-[22mm] w-[22mm]'}
              />
              <div className="min-w-0 leading-tight">
                <p className={cx('font-mono font-bold', layout === 'sheet' ? 'text-lg' : 'text-sm')}>{l.label}</p>
                <p className="text-xs">{l.grain}</p>
                <p className="text-xs">{l.inoculatedOn}</p>
                {l.inoculumCode && <p className="truncate text-xs">{l.inoculumCode}</p>}
                {l.sessionCode && layout === 'sheet' && <p className="truncate text-xs">{l.sessionCode}</p>}
              </div>
            </div>
          ))}
        </div>
      )}
    </>
  );
}
