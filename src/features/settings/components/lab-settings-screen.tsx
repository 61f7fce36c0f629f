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
import { applyServerErrors, Form } from '../../../components/ui/form';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { TextInput } from '../../../components/ui/text-input';
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
      {({ register, formState, watch }) => {
        const preview = edgesText.safeParse(watch('cookBucketEdges'));
        return (
          <>
            <TextInput
              label="Cook-duration bucket edges (whole minutes at pressure)"
              hint={
                preview.success
                  ? `Buckets: ${cookBucketLabels(preview.data).join(', ')}`
                  : 'Rising whole minutes, separated by commas.'
              }
              error={formState.errors.cookBucketEdges?.message}
              {...register('cookBucketEdges')}
            />
            <TextInput
              label="Lethality target (F0, minutes)"
              hint="Applies only to a temperature log from a probe at the jar centre: a chamber log or an estimate overstates what the grain received."
              inputMode="decimal"
              error={formState.errors.lethalityTarget?.message}
              {...register('lethalityTarget')}
            />
            <TextInput
              label="Least minutes at pressure per container"
              hint="Runs without a jar-centre log are judged by these, at about 103 kPa (15 psi) gauge. Defaults are common practice (1 L jar 90, 2 L jar 120, 3 kg bag 150); set your own from your own validation."
              error={formState.errors.containerMinutes?.message}
              {...register('containerMinutes')}
            />
            <TextInput
              label="Accepted contamination rate (%)"
              hint="Settled weeks above this are marked even when they are in control. 5 % is a common choice; common practice varies, and no published benchmark exists."
              inputMode="decimal"
              error={formState.errors.contaminationTarget?.message}
              {...register('contaminationTarget')}
            />
            <TextInput
              label="Observation window (days)"
              hint="A clean jar younger than this is still incubating; weeks holding such jars are provisional."
              inputMode="numeric"
              error={formState.errors.observationWindowDays?.message}
              {...register('observationWindowDays')}
            />
            <TextInput
              label="Cluster alert: incidents"
              hint="This many incidents on one cook run, culture or session…"
              inputMode="numeric"
              error={formState.errors.clusterIncidents?.message}
              {...register('clusterIncidents')}
            />
            <TextInput
              label="Cluster alert: within days"
              hint="…found within this many days sends an alert."
              inputMode="numeric"
              error={formState.errors.clusterDays?.message}
              {...register('clusterDays')}
            />
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
