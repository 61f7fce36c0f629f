import { useNavigate } from 'react-router';
import { createProcedureSchema } from '../../../../shared/schemas/procedures';
import { FormDialog } from '../../../components/ui/form-dialog';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { useCreateProcedure } from '../api/use-create-procedure';
import { StepsEditor } from './steps-editor';

type EditorProps = Parameters<typeof StepsEditor>[0];

export function CreateProcedureDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const create = useCreateProcedure();
  const toast = useToast();
  const navigate = useNavigate();
  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={create.isPending}
      title="New procedure"
      description="Publishing makes this version 1. Later changes are published as new versions; this one stays as written."
      submitLabel="Publish version 1"
      submitIcon="plus"
      schema={createProcedureSchema}
      options={{ defaultValues: { code: '', title: '', changeNote: '', steps: [{ text: '', caution: '' }] } }}
      serverFields={['code', 'title', 'changeNote', 'steps']}
      onSubmit={async (values) => {
        const created = await create.mutateAsync(values);
        toast.success(`Procedure ${created.code} published.`);
        onClose();
        void navigate(paths.procedure.to(created.id));
      }}
    >
      {({ register, control, formState: { errors } }) => (
        <>
          <TextInput
            label="Code"
            hint="Short and unique, such as STERILE-INOC."
            error={errors.code?.message}
            {...register('code')}
          />
          <TextInput label="Title" error={errors.title?.message} {...register('title')} />
          <TextInput label="Note" optional error={errors.changeNote?.message} {...register('changeNote')} />
          <StepsEditor
            control={control as unknown as EditorProps['control']}
            register={register as unknown as EditorProps['register']}
            errors={errors}
          />
        </>
      )}
    </FormDialog>
  );
}
