import { useNavigate } from 'react-router';
import { createProcedureSchema } from '../../../../shared/schemas/procedures';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { TextField } from '../../../components/ui/form-fields';
import { paths } from '../../../config/paths';
import { useCreateProcedure } from '../api/use-create-procedure';
import { StepsEditor } from './steps-editor';

export function CreateProcedureDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const create = useCreateProcedure();
  const navigate = useNavigate();
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={create}
      title="New procedure"
      description="Publishing makes this version 1. Later changes are published as new versions; this one stays as written."
      submitLabel="Publish version 1"
      submitIcon="plus"
      schema={createProcedureSchema}
      options={{ defaultValues: { code: '', title: '', changeNote: '', steps: [{ text: '', caution: '' }] } }}
      serverFields={['code', 'title', 'changeNote', 'steps']}
      saved={(created) => `Procedure ${created.code} published.`}
      then={(created) => void navigate(paths.procedure.to(created.id))}
    >
      {(form) => (
        <>
          <TextField form={form} name="code" label="Code" hint="Short and unique, such as STERILE-INOC." />
          <TextField form={form} name="title" label="Title" />
          <TextField form={form} name="changeNote" label="Note" optional />
          <StepsEditor form={form} />
        </>
      )}
    </SaveDialog>
  );
}
