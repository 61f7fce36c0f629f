import { createUserSchema } from '../../../../shared/schemas/users';
import { FormDialog } from '../../../components/ui/form-dialog';
import { PasswordField, SelectField, TextField, UsernameField } from '../../../components/ui/form-fields';
import { useToast } from '../../../components/ui/toast';
import { useCreateUser } from '../api/use-create-user';
import { roleOptions } from './role-options';

export function CreateUserDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const createUser = useCreateUser();
  const toast = useToast();

  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={createUser.isPending}
      title="New user"
      description="They sign in with this username and the first password you set here."
      submitLabel="Create user"
      submitIcon="plus"
      schema={createUserSchema}
      options={{ defaultValues: { username: '', displayName: '', email: '', role: 'technician', password: '' } }}
      serverFields={['username', 'displayName', 'email', 'role', 'password']}
      onSubmit={async (values) => {
        const user = await createUser.mutateAsync(values);
        toast.success(`Account ${user.username} created.`);
        onClose();
      }}
    >
      {(form) => (
        <>
          <TextField
            form={form}
            name="displayName"
            label="Name"
            hint="As colleagues know them; shown on records they make."
            autoComplete="off"
          />
          <UsernameField
            form={form}
            name="username"
            hint="Lower-case letters, digits, dot, dash or underscore. It cannot be changed later."
            autoComplete="off"
          />
          <TextField
            form={form}
            name="email"
            label="E-mail"
            type="email"
            optional
            hint="Needed for alerts and digests."
            autoComplete="off"
          />
          <SelectField form={form} name="role" label="Role" options={roleOptions} />
          <PasswordField
            form={form}
            name="password"
            label="First password"
            autoComplete="new-password"
            hint="At least 10 characters. Give it to them in person and ask them to change it from Account."
          />
        </>
      )}
    </FormDialog>
  );
}
