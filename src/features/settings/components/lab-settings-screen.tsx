import { useQuery } from '@tanstack/react-query';
import { z } from 'zod';
import {
  cookBucketEdgesSchema,
  cookBucketLabels,
  containerMinutesSchema,
  labSettingsSchema,
  type LabSettingsDto,
} from '../../../../shared/schemas/settings';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/form-fields';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { settingsQueries, useUpdateLabSettings } from '../api/settings-queries';

const edgesText = z
  .string()
  .trim()
  .min(1, 'give at least one edge')
  .transform((text) =>
    text
      .split(/[\s,;]+/)
      .filter(Boolean)
      .map(Number),
  )
  .pipe(cookBucketEdgesSchema);

/** "1 L jar: 90; 3 kg bag: 150" → { "1 L jar": 90, "3 kg bag": 150 } */
const containerMinutesText = z
  .string()
  .trim()
  .transform((text, ctx) => {
    const out: Record<string, number> = {};
    for (const part of text.split(/[;\n]+/).filter((p) => p.trim())) {
      const m = /^(.+?)\s*[:=]\s*(\d+)\s*$/.exec(part.trim());
      if (!m?.[1] || !m[2]) {
        ctx.addIssue({ code: 'custom', message: `write “container: minutes”, not “${part.trim()}”` });
        return z.NEVER;
      }
      out[m[1].trim()] = Number(m[2]);
    }
    return out;
  })
  .pipe(containerMinutesSchema);

const percentText = z.coerce
  .number<string>()
  .min(0, 'must not be negative')
  .max(100, 'must be at most 100 %')
  .transform((v) => v / 100);

const formSchema = z.object({
  cookBucketEdges: edgesText,
  lethalityTarget: z.coerce.number<string>().pipe(labSettingsSchema.shape.lethalityTarget),
  containerMinutes: containerMinutesText,
  contaminationTarget: percentText,
  observationWindowDays: z.coerce.number<string>().pipe(labSettingsSchema.shape.observationWindowDays),
  clusterIncidents: z.coerce.number<string>().pipe(labSettingsSchema.shape.clusterIncidents),
  clusterDays: z.coerce.number<string>().pipe(labSettingsSchema.shape.clusterDays),
});
const fields = [
  'cookBucketEdges',
  'lethalityTarget',
  'containerMinutes',
  'contaminationTarget',
  'observationWindowDays',
  'clusterIncidents',
  'clusterDays',
] as const;

type FieldName = (typeof fields)[number];

const thresholdFields: { name: FieldName; label: string; hint: string; inputMode?: 'decimal' | 'numeric' }[] = [
  {
    name: 'lethalityTarget',
    label: 'Lethality target (F0, minutes)',
    hint: 'Applies only to a temperature log from a probe at the jar centre: a chamber log or an estimate overstates what the grain received.',
    inputMode: 'decimal',
  },
  {
    name: 'containerMinutes',
    label: 'Least minutes at pressure per container',
    hint: 'Runs without a jar-centre log are judged by these, at about 103 kPa (15 psi) gauge. Defaults are common practice (1 L jar 90, 2 L jar 120, 3 kg bag 150); set your own from your own validation.',
  },
  {
    name: 'contaminationTarget',
    label: 'Accepted contamination rate (%)',
    hint: 'Settled weeks above this are marked even when they are in control. 5 % is a common choice; common practice varies, and no published benchmark exists.',
    inputMode: 'decimal',
  },
  {
    name: 'observationWindowDays',
    label: 'Observation window (days)',
    hint: 'A clean jar younger than this is still incubating; weeks holding such jars are provisional.',
    inputMode: 'numeric',
  },
  {
    name: 'clusterIncidents',
    label: 'Cluster alert: incidents',
    hint: 'This many incidents on one cook run, culture or session…',
    inputMode: 'numeric',
  },
  {
    name: 'clusterDays',
    label: 'Cluster alert: within days',
    hint: '…found within this many days sends an alert.',
    inputMode: 'numeric',
  },
];

function SettingsForm({ settings }: { settings: LabSettingsDto }) {
  const update = useUpdateLabSettings();
  const toast = useToast();
  return (
    <Form
      schema={formSchema}
      className="max-w-xl"
      options={{
        defaultValues: {
          cookBucketEdges: settings.cookBucketEdges.join(', '),
          lethalityTarget: String(settings.lethalityTarget),
          containerMinutes: Object.entries(settings.containerMinutes)
            .map(([name, minutes]) => `${name}: ${minutes}`)
            .join('; '),
          contaminationTarget: String(Math.round(settings.contaminationTarget * 1000) / 10),
          observationWindowDays: String(settings.observationWindowDays),
          clusterIncidents: String(settings.clusterIncidents),
          clusterDays: String(settings.clusterDays),
        },
      }}
      onSubmit={(values, methods) =>
        update.mutate(values, {
          onSuccess: () => toast.success('Lab settings saved.'),
          onError: (error) => applyServerErrors(error, methods.setError, fields),
        })
      }
    >
      {(form) => {
        const preview = edgesText.safeParse(form.watch('cookBucketEdges'));
        return (
          <>
            <TextField
              form={form}
              name="cookBucketEdges"
              label="Cook-duration bucket edges (whole minutes at pressure)"
              hint={
                preview.success
                  ? `Buckets: ${cookBucketLabels(preview.data).join(', ')}`
                  : 'Rising whole minutes, separated by commas.'
              }
            />
            {thresholdFields.map((field) => (
              <TextField key={field.name} form={form} {...field} />
            ))}
            <div>
              <Button type="submit" pending={update.isPending}>
                Save settings
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}

/** The admin's lab-wide thresholds: every change is recorded in the audit trail. */
export function LabSettingsScreen() {
  const settings = useQuery(settingsQueries.detail());
  return (
    <>
      <PageHeader
        title="Lab settings"
        description="Thresholds the analysis and alerts use. Each change is kept in the audit trail with its old and new value."
      />
      {settings.isPending && <FullPageSpinner label="Loading settings" />}
      {settings.error && (
        <Notice tone="danger" title="The settings could not be loaded">
          <p role="alert">{errorMessage(settings.error)}</p>
        </Notice>
      )}
      {settings.data && <SettingsForm settings={settings.data} />}
    </>
  );
}
