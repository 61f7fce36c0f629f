import { useNavigate } from 'react-router';
import { publishVersionSchema, type ProcedureVersionDto } from '../../../../shared/schemas/procedures';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { TextField } from '../../../components/ui/form-fields';
import { paths } from '../../../config/paths';
import { usePublishVersion } from '../api/use-publish-version';
import { StepsEditor } from './steps-editor';

/** Starts from the current version's steps; publishing writes new rows and leaves that version as it was. */
export function PublishVersionDialog({
  current,
  open,
  onClose,
}: {
  current: ProcedureVersionDto;
  open: boolean;
  onClose: () => void;
}) {
  const publish = usePublishVersion(current.procedureId);
  const navigate = useNavigate();
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={publish}
      title={`Publish version ${current.version + 1}`}
      description={`Version ${current.version} stays readable and unchanged. Staff trained on it will show as not trained on the new version.`}
      submitLabel="Publish"
      schema={publishVersionSchema}
      options={{
        defaultValues: {
          title: current.title,
          changeNote: '',
          steps: current.steps.map((s) => ({ text: s.text, caution: s.caution ?? '' })),
        },
      }}
      serverFields={['title', 'changeNote', 'steps']}
      saved={(version) => `Version ${version.version} published.`}
      then={(version) => void navigate(paths.procedureVersion.to(version.id))}
    >
      {(form) => (
        <>
          <TextField form={form} name="title" label="Title" />
          <TextField form={form} name="changeNote" label="What changed and why" />
          <StepsEditor form={form} />
        </>
      )}
    </SaveDialog>
  );
}
