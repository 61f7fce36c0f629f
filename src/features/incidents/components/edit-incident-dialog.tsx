import { contaminantNames, contaminants, stagesFound, incidentSeverities } from '../../../../shared/enums';
import { updateIncidentSchema } from '../../../../shared/schemas/incidents';
import type { IncidentDetailDto } from '../../../../shared/schemas/incident-detail';
import { Checkbox } from '../../../components/ui/checkbox';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { useUpdateIncident } from '../api/use-incident-mutations';
import { severityLabels, stageLabels } from '../labels';
import { NotesField } from './notes-field';

const fields = [
  'contaminant',
  'severity',
  'stage',
  'signColour',
  'signSmell',
  'signTexture',
  'sealed',
  'sterilisedBeforeDisposal',
  'notes',
  'reason',
  'version',
] as const;
const blankToNull = (v: string) => (v.trim() === '' ? null : v);

/** Descriptive fields only; status and verdict belong to the review. Each change is audited with the reason. */
export function EditIncidentDialog({
  incident,
  open,
  onClose,
}: {
  incident: IncidentDetailDto;
  open: boolean;
  onClose: () => void;
}) {
  const update = useUpdateIncident(incident.id);
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      title={`Edit incident ${incident.id}`}
      mutation={update}
      submitLabel="Save changes"
      formKey={`${incident.version}-${String(open)}`}
      serverFields={fields}
      schema={updateIncidentSchema}
      options={{
        defaultValues: {
          version: incident.version,
          contaminant: incident.contaminant,
          severity: incident.severity,
          stage: incident.stage,
          signColour: incident.signColour,
          signSmell: incident.signSmell,
          signTexture: incident.signTexture,
          sealed: incident.sealed,
          sterilisedBeforeDisposal: incident.sterilisedBeforeDisposal,
          notes: incident.notes,
        },
      }}
      saved={() => `Incident ${incident.id} updated.`}
    >
      {({ register, formState: { errors } }) => (
        <>
          <Select
            label="Contaminant"
            options={contaminants.map((c) => ({ value: c, label: contaminantNames[c] }))}
            error={errors.contaminant?.message}
            {...register('contaminant')}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <Select
              label="Severity"
              options={incidentSeverities.map((s) => ({ value: s, label: severityLabels[s] }))}
              {...register('severity')}
            />
            <Select
              label="Stage found"
              options={stagesFound.map((s) => ({ value: s, label: stageLabels[s] }))}
              {...register('stage')}
            />
          </div>
          <div className="grid gap-4 sm:grid-cols-3">
            <TextInput
              label="Colour"
              optional
              error={errors.signColour?.message}
              {...register('signColour', { setValueAs: blankToNull })}
            />
            <TextInput
              label="Smell"
              optional
              error={errors.signSmell?.message}
              {...register('signSmell', { setValueAs: blankToNull })}
            />
            <TextInput
              label="Texture"
              optional
              error={errors.signTexture?.message}
              {...register('signTexture', { setValueAs: blankToNull })}
            />
          </div>
          <Checkbox label="Sealed" {...register('sealed')} />
          <Checkbox label="Sterilised before disposal" {...register('sterilisedBeforeDisposal')} />
          <NotesField
            label="Notes"
            optional
            error={errors.notes?.message}
            {...register('notes', { setValueAs: blankToNull })}
          />
          <TextInput
            label="Reason for the change"
            optional
            error={errors.reason?.message}
            {...register('reason', { setValueAs: (v: string) => v.trim() || undefined })}
          />
        </>
      )}
    </SaveDialog>
  );
}
