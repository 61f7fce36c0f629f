import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import type { HoldResultDto, LineageTreeDto } from '../../../../shared/schemas/jar-lineage';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { TextInput } from '../../../components/ui/text-input';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { jarsQueries } from '../api/jars-queries';
import { useHoldLineage } from '../api/use-hold-lineage';
import { JarStatusBadge } from './jar-status-badge';
import { countOf } from '../../../lib/count-text';

type JarNode = Extract<LineageTreeDto['node'], { kind: 'jar' }>;

/** What a hold would touch, read off the tree the screen already shows. */
export function holdPreview(tree: LineageTreeDto): { hold: JarNode[]; recall: JarNode[] } {
  const hold: JarNode[] = [];
  const recall: JarNode[] = [];
  const walk = (t: LineageTreeDto) => {
    if (t.node.kind === 'jar') {
      if (t.node.status === 'incubating' || t.node.status === 'colonised') hold.push(t.node);
      if (t.node.status === 'released') recall.push(t.node);
    }
    t.children.forEach(walk);
  };
  walk(tree);
  return { hold, recall };
}

function Branch({ tree }: { tree: LineageTreeDto }) {
  const { node } = tree;
  return (
    <li className="space-y-2">
      <div className="flex min-h-touch flex-wrap items-center gap-2">
        {node.kind === 'culture' ? (
          <Link to={paths.culture.to(node.id)} className="font-semibold text-accent underline">
            Culture {node.code}
          </Link>
        ) : (
          <>
            <Link to={paths.jarPage.to(node.label)} className="font-mono font-semibold text-accent underline">
              {node.label}
            </Link>
            <JarStatusBadge status={node.status} />
            {node.releasedTo && (
              <span className="text-sm text-muted">
                to {node.releasedTo === 'customer' ? (node.releasedToWho ?? 'a customer') : 'the grow room'}
                {node.releasedOn ? ` on ${node.releasedOn}` : ''}
              </span>
            )}
          </>
        )}
        {node.kind === 'culture' && <span className="text-sm text-muted">{node.state}</span>}
      </div>
      {tree.children.length > 0 && (
        <ul className="space-y-2 border-l-2 border-line pl-4">
          {tree.children.map((c) => (
            <Branch key={`${c.node.kind}${c.node.id}`} tree={c} />
          ))}
        </ul>
      )}
    </li>
  );
}

function RecallList({
  rows,
}: {
  rows: { label: string; releasedTo: string | null; releasedToWho: string | null; releasedOn: string | null }[];
}) {
  if (rows.length === 0) return <p>No jar made from it has left the lab.</p>;
  return (
    <ul className="list-disc space-y-1 pl-5">
      {rows.map((r) => (
        <li key={r.label}>
          <span className="font-mono">{r.label}</span> —{' '}
          {r.releasedTo === 'customer' ? (r.releasedToWho ?? 'a customer') : 'grow room'}
          {r.releasedOn ? `, ${r.releasedOn}` : ''}
        </li>
      ))}
    </ul>
  );
}

export function LineageView({ kind, id, canHold }: { kind: 'culture' | 'jar'; id: number; canHold: boolean }) {
  const tree = useQuery(jarsQueries.lineage(kind, id));
  const hold = useHoldLineage(kind, id);
  const [confirming, setConfirming] = useState(false);
  const [reason, setReason] = useState('');
  const [result, setResult] = useState<HoldResultDto | null>(null);
  if (tree.isPending) return <FullPageSpinner />;
  if (tree.error)
    return (
      <Notice tone="danger" title="The lineage could not be loaded.">
        {errorMessage(tree.error)}
      </Notice>
    );
  const preview = holdPreview(tree.data);
  const root = tree.data.node;
  const name = root.kind === 'culture' ? `culture ${root.code}` : `jar ${root.label}`;

  return (
    <>
      <PageHeader
        title={`Where used: ${name}`}
        description="Every jar made from it, at any depth, with its status now."
        actions={
          canHold && (
            <Button variant="danger" disabled={preview.hold.length === 0} onClick={() => setConfirming(true)}>
              Hold everything unreleased
            </Button>
          )
        }
      />
      {result && (
        <Notice tone="ok" title={`${countOf(result.held.length, 'jar')} put on hold.`} className="mb-6">
          <p className="font-medium">For recall:</p>
          <RecallList rows={result.recall} />
        </Notice>
      )}
      <ul className="space-y-2">
        <Branch tree={tree.data} />
      </ul>
      <ConfirmDialog
        open={confirming}
        onClose={() => setConfirming(false)}
        title={`Hold what was made from ${name}?`}
        confirmLabel={`Hold ${countOf(preview.hold.length, 'jar')}`}
        pending={hold.isPending}
        error={hold.error ? errorMessage(hold.error) : undefined}
        onConfirm={async () => {
          try {
            setResult(await hold.mutateAsync(reason));
            setConfirming(false);
            setReason('');
          } catch {
            // shown in the dialog
          }
        }}
      >
        <p>These jars will be put on hold, all in one go:</p>
        <p className="font-mono text-sm break-words">{preview.hold.map((j) => j.label).join(', ')}</p>
        <p className="font-medium">Already released — contact these for recall:</p>
        <RecallList rows={preview.recall} />
        <TextInput
          label="Reason"
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          hint="Recorded on every jar and in the audit trail."
        />
      </ConfirmDialog>
    </>
  );
}
