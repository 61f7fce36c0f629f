import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useSearchParams } from 'react-router';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { Pager } from '../../../components/ui/table/pager';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { patchParams, readTableState } from '../../../lib/list-params';
import { mailQueries } from '../api/mail-queries';
import { useSendDigest } from '../api/use-mail-mutations';
import { formatDateTime } from '../../../lib/format';
import { PlainTableHead } from '../../../components/ui/table/table-parts';

function SentMailDialog({ id, onClose }: { id: number | null; onClose: () => void }) {
  const detail = useQuery({ ...mailQueries.sentDetail(id ?? 0), enabled: id !== null });
  return (
    <Dialog
      open={id !== null}
      onClose={onClose}
      title={detail.data?.subject ?? 'Message'}
      description={detail.data ? `To ${detail.data.to}` : undefined}
    >
      {detail.isPending && <Spinner label="Loading the message" />}
      {detail.data && <pre className="whitespace-pre-wrap break-words font-mono text-sm">{detail.data.text}</pre>}
    </Dialog>
  );
}

export function SentMailScreen() {
  const [params, setParams] = useSearchParams();
  const { page, pageSize } = readTableState(params, []);
  const sent = useQuery(mailQueries.sent(page, pageSize));
  const digest = useSendDigest();
  const toast = useToast();
  const [open, setOpen] = useState<number | null>(null);
  return (
    <>
      <PageHeader
        title="Sent mail"
        description="Every message Asepta handed to the mail server, newest first. A failed send is kept with its error."
        actions={
          <Button
            variant="secondary"
            pending={digest.isPending}
            onClick={() =>
              digest.mutate(undefined, {
                onSuccess: (r) => toast.success(`Digest for ${r.week}: ${r.sent} sent, ${r.failed} failed.`),
                onError: (e) => toast.error(errorMessage(e)),
              })
            }
          >
            Send the weekly digest now
          </Button>
        }
      />
      {sent.isPending && <Spinner label="Loading sent mail" />}
      {sent.error && <Notice tone="danger">{errorMessage(sent.error)}</Notice>}
      {sent.data && sent.data.total === 0 && <EmptyState title="Nothing sent yet" />}
      {sent.data && sent.data.total > 0 && (
        <div className="overflow-x-auto rounded-lg border border-line bg-surface-raised">
          <table className="w-full text-left">
            <caption className="sr-only">Sent mail</caption>
            <thead className="border-b border-line text-muted">
              <PlainTableHead headings={['When', 'To', 'Subject', 'Status']} cellClassName="px-3 py-2 font-medium" />
            </thead>
            <tbody>
              {sent.data.items.map((m) => (
                <tr key={m.id} className="border-b border-line last:border-0">
                  <td className="whitespace-nowrap px-3 py-2">{formatDateTime(m.createdAt)}</td>
                  <td className="px-3 py-2">{m.to}</td>
                  <td className="px-3 py-2">
                    <button
                      type="button"
                      className="text-left text-accent underline-offset-2 hover:underline"
                      onClick={() => setOpen(m.id)}
                    >
                      {m.subject}
                    </button>
                  </td>
                  <td className="px-3 py-2">
                    {m.status === 'sent' ? <Badge tone="ok">sent</Badge> : <Badge tone="danger">failed</Badge>}
                    {m.error && <span className="ml-2 text-sm text-muted">{m.error}</span>}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
          <Pager
            page={page}
            pageSize={pageSize}
            total={sent.data.total}
            totalCapped={sent.data.totalCapped}
            onChange={(patch) => setParams(patchParams(params, patch))}
          />
        </div>
      )}
      <SentMailDialog id={open} onClose={() => setOpen(null)} />
    </>
  );
}
