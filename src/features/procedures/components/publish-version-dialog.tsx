import { useId } from 'react';
import { useNavigate } from 'react-router';
import { publishVersionSchema, type ProcedureVersionDto } from '../../../../shared/schemas/procedures';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { usePublishVersion } from '../api/use-publish-version';
import { StepsEditor } from './steps-editor';

type EditorProps = Parameters<typeof StepsEditor>[0];

/** Starts from the current version's steps; publishing writes new rows and leaves that version as it was. */
export function PublishVersionDialog({ current, open, onClose }: { current: ProcedureVersionDto; open: boolean; onClose: () => void }) {
  const formId = useId();
  const publish = usePublishVersion(current.procedureId);
  const toast = useToast();
  const navigate = useNavigate();
  return (
    <Dialog
      open={open}
      onClose={onClose}
      busy={publish.isPending}
      title={`Publish version ${current.version + 1}`}
      description={`Version ${current.version} stays readable and unchanged. Staff trained on it will show as not trained on the new version.`}
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={publish.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={publish.isPending}>
            Publish
          </Button>
        </>
      }
    >
      <Form
        id={formId}
        schema={publishVersionSchema}
        options={{
          defaultValues: {
            title: current.title,
            changeNote: '',
            steps: current.steps.map((s) => ({ text: s.text, caution: s.caution ?? '' })),
          },
        }}
        onSubmit={async (values, { setError }) => {
          try {
            const version = await publish.mutateAsync(values);
            toast.success(`Version ${version.version} published.`);
            onClose();
            void navigate(paths.procedureVersion.to(version.id));
          } catch (error) {
            applyServerErrors(error, setError, ['title', 'changeNote', 'steps']);
          }
        }}
      >
        {({ register, control, formState: { errors } }) => (
          <>
            <TextInput label="Title" error={errors.title?.message} {...register('title')} />
            <TextInput label="What changed and why" error={errors.changeNote?.message} {...register('changeNote')} />
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
