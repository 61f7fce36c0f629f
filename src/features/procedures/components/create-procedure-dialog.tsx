import { useId } from 'react';
import { useNavigate } from 'react-router';
import { createProcedureSchema } from '../../../../shared/schemas/procedures';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { useCreateProcedure } from '../api/use-create-procedure';
import { StepsEditor } from './steps-editor';

type EditorProps = Parameters<typeof StepsEditor>[0];

export function CreateProcedureDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const formId = useId();
  const create = useCreateProcedure();
  const toast = useToast();
  const navigate = useNavigate();
  return (
    <Dialog
      open={open}
      onClose={onClose}
      busy={create.isPending}
      title="New procedure"
      description="Publishing makes this version 1. Later changes are published as new versions; this one stays as written."
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={create.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={create.isPending} icon="plus">
            Publish version 1
          </Button>
        </>
      }
    >
      <Form
        id={formId}
        schema={createProcedureSchema}
        options={{ defaultValues: { code: '', title: '', changeNote: '', steps: [{ text: '', caution: '' }] } }}
        onSubmit={async (values, { setError }) => {
          try {
            const created = await create.mutateAsync(values);
            toast.success(`Procedure ${created.code} published.`);
            onClose();
            void navigate(paths.procedure.to(created.id));
          } catch (error) {
            applyServerErrors(error, setError, ['code', 'title', 'changeNote', 'steps']);
          }
        }}
      >
        {({ register, control, formState: { errors } }) => (
          <>
            <TextInput label="Code" hint="Short and unique, such as STERILE-INOC." error={errors.code?.message} {...register('code')} />
            <TextInput label="Title" error={errors.title?.message} {...register('title')} />
            <TextInput label="Note" optional error={errors.changeNote?.message} {...register('changeNote')} />
            <StepsEditor
              control={control as unknown as EditorProps['control']}
              register={register as unknown as EditorProps['register']}
              errors={errors}
            />
          </>
        )}
      </Form>
    </Dialog>
  );
}
