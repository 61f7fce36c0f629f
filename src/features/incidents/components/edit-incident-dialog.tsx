import { contaminantNames, contaminants, stagesFound, incidentSeverities } from '../../../../shared/enums';
import { updateIncidentSchema } from '../../../../shared/schemas/incidents';
import type { IncidentDetailDto } from '../../../../shared/schemas/incident-detail';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { Checkbox } from '../../../components/ui/checkbox';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { Select } from '../../../components/ui/select';
import { trimmedOrUndefined } from '../../../lib/form-values';
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
const blankToNull = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? null : v);

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
      {(form) => (
        <>
          <SelectField
            form={form}
            name="contaminant"
            label="Contaminant"
            options={contaminants.map((c) => ({ value: c, label: contaminantNames[c] }))}
          />
          <div className="grid gap-4 sm:grid-cols-2">
            <Select
              label="Severity"
              options={incidentSeverities.map((s) => ({ value: s, label: severityLabels[s] }))}
              {...form.register('severity')}
            />
            <Select
              label="Stage found"
              options={stagesFound.map((s) => ({ value: s, label: stageLabels[s] }))}
              {...form.register('stage')}
            />
          </div>
          <div className="grid gap-4 sm:grid-cols-3">
            <TextField form={form} name="signColour" label="Colour" optional setValueAs={blankToNull} />
            <TextField form={form} name="signSmell" label="Smell" optional setValueAs={blankToNull} />
            <TextField form={form} name="signTexture" label="Texture" optional setValueAs={blankToNull} />
          </div>
          <Checkbox label="Sealed" {...form.register('sealed')} />
          <Checkbox label="Sterilised before disposal" {...form.register('sterilisedBeforeDisposal')} />
          <NotesField
            label="Notes"
            optional
            error={form.formState.errors.notes?.message}
            {...form.register('notes', { setValueAs: blankToNull })}
          />
          <TextField form={form} name="reason" label="Reason for the change" optional setValueAs={trimmedOrUndefined} />
        </>
      )}
    </SaveDialog>
  );
}
