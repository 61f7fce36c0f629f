import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Link } from 'react-router';
import {
  createJarBatchSchema,
  type CreateJarBatchFields,
  type JarBatchResultDto,
} from '../../../../shared/schemas/jars';
import { Button, buttonClasses } from '../../../components/ui/button';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { NumberField, SelectField, TextField } from '../../../components/ui/form-fields';
import { numberOrUndefined, textOrUndefined } from '../../../lib/form-values';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { useToast } from '../../../components/ui/toast';
import { cautions, cautionFootnote } from '../../../config/cautions';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { jarsQueries } from '../api/jars-queries';
import { useCreateJarBatch } from '../api/use-create-jar-batch';
import { InoculumFields } from './inoculum-fields';

const fields = [
  'sessionId',
  'count',
  'grainId',
  'prepBatchId',
  'cookRunId',
  'cultureId',
  'parentJarId',
  'inoculumMl',
  'room',
  'shelf',
  'inoculatedAt',
] as const;
/** The input's wall-clock value as an instant with the browser's offset; the server takes no other form. */
const instantOfLocal = (v: unknown) => {
  if (typeof v !== 'string' || !v) return undefined;
  const at = new Date(v);
  return Number.isNaN(at.getTime()) ? v : at.toISOString();
};
const nowLocal = () => {
  const d = new Date();
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
};

function Result({ result, sessionId, onAgain }: { result: JarBatchResultDto; sessionId: number; onAgain: () => void }) {
  const first = result.jars[0];
  const last = result.jars.at(-1);
  return (
    <div className="space-y-4">
      <Notice
        tone="ok"
        title={`${result.jars.length} jars made: ${first?.label ?? ''}${last && last !== first ? ` to ${last.label}` : ''}.`}
      />
      {result.warnings.map((w) => (
        <Notice key={w} tone="warn">
          {w}
        </Notice>
      ))}
      <div className="flex flex-wrap gap-3">
        <Link
          to={paths.jarLabels.to({ ids: result.jars.map((j) => j.id).join(',') })}
          className={buttonClasses('primary')}
        >
          Print their labels
        </Link>
        <Link to={paths.session.to(sessionId)} className={buttonClasses('secondary')}>
          See the session’s jars
        </Link>
        <Button variant="ghost" onClick={onAgain}>
          Make more jars
        </Button>
      </div>
    </div>
  );
}

export function MakeJarsForm({ sessionId }: { sessionId: number | undefined }) {
  const options = useQuery(jarsQueries.options());
  const create = useCreateJarBatch();
  const toast = useToast();
  const [result, setResult] = useState<{ data: JarBatchResultDto; sessionId: number } | null>(null);
  const flame = cautions.find((c) => c.id === 'flame');

  if (result)
    return (
      <>
        <PageHeader title="Make jars" />
        <Result result={result.data} sessionId={result.sessionId} onAgain={() => setResult(null)} />
      </>
    );
  if (options.isPending) return <Spinner label="Loading the registers" />;
  if (options.error)
    return (
      <Notice tone="danger" title="The form could not be loaded.">
        {errorMessage(options.error)}
      </Notice>
    );
  const o = options.data;
  const pick = (items: { id: number; label: string }[], none: string) => [
    { value: '', label: none },
    ...items.map((i) => ({ value: String(i.id), label: i.label })),
  ];

  return (
    <>
      <PageHeader
        title="Make jars"
        description="Record a batch of jars from one session; labels are issued in sequence."
      />
      {flame && (
        <Notice tone="warn" title={flame.title} className="mb-6">
          {flame.text} {cautionFootnote}
        </Notice>
      )}
      <Form
        schema={createJarBatchSchema}
        options={{
          defaultValues: { sessionId, count: 12 } as unknown as CreateJarBatchFields,
        }}
        onSubmit={async (values, { setError }) => {
          try {
            const data = await create.mutateAsync(values);
            toast.success(`${data.jars.length} jars made.`);
            setResult({ data, sessionId: values.sessionId });
          } catch (error) {
            applyServerErrors(error, setError, fields);
          }
        }}
      >
        {(methods) => {
          return (
            <>
              <div className="grid gap-4 sm:grid-cols-2">
                <SelectField
                  form={methods}
                  name="sessionId"
                  label="Session"
                  options={pick(
                    o.sessions.map((s) => ({ id: s.id, label: `${s.code} · ${s.heldOn}` })),
                    'Choose a session',
                  )}
                  setValueAs={numberOrUndefined}
                />
                <NumberField form={methods} name="count" label="Number of jars" min={1} max={200} />
                <SelectField
                  form={methods}
                  name="prepBatchId"
                  label="Prep batch"
                  optional
                  hint="The grain comes from the batch when one is chosen."
                  options={pick(
                    o.prepBatches.map((b) => ({ id: b.id, label: `${b.code} · ${b.grain} · ${b.preparedOn}` })),
                    'No batch recorded',
                  )}
                  setValueAs={numberOrUndefined}
                />
                <SelectField
                  form={methods}
                  name="grainId"
                  label="Grain"
                  optional
                  options={pick(
                    o.grains.filter((g) => g.active).map((g) => ({ id: g.id, label: g.name })),
                    'From the prep batch',
                  )}
                  setValueAs={numberOrUndefined}
                />
                <SelectField
                  form={methods}
                  name="cookRunId"
                  label="Cook run"
                  optional
                  options={pick(
                    o.cookRuns.map((c) => ({ id: c.id, label: `${c.code}${c.cookedOn ? ` · ${c.cookedOn}` : ''}` })),
                    'No cook run recorded',
                  )}
                  setValueAs={numberOrUndefined}
                />
                <TextField
                  form={methods}
                  name="inoculatedAt"
                  label="Inoculated at"
                  type="datetime-local"
                  // Not in defaultValues: react-hook-form reads it from the input through setValueAs.
                  defaultValue={nowLocal()}
                  setValueAs={instantOfLocal}
                />
              </div>
              <InoculumFields methods={methods} cultures={o.cultures} />
              <div className="grid gap-4 sm:grid-cols-2">
                <TextField form={methods} name="room" label="Incubation room" optional setValueAs={textOrUndefined} />
                <TextField form={methods} name="shelf" label="Shelf" optional setValueAs={textOrUndefined} />
              </div>
              <Button type="submit" pending={create.isPending} className="min-h-14 text-lg sm:self-start">
                Make jars
              </Button>
            </>
          );
        }}
      </Form>
    </>
  );
}
