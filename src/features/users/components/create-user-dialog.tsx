import { createUserSchema } from '../../../../shared/schemas/users';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { PasswordField, SelectField, TextField, UsernameField } from '../../../components/ui/form-fields';
import { useCreateUser } from '../api/use-create-user';
import { roleOptions } from './role-options';

export function CreateUserDialog({ open, onClose }: { open: boolean; onClose: () => void }) {
  const createUser = useCreateUser();

  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={createUser}
      title="New user"
      description="They sign in with this username and the first password you set here."
      submitLabel="Create user"
      submitIcon="plus"
      schema={createUserSchema}
      options={{ defaultValues: { username: '', displayName: '', email: '', role: 'technician', password: '' } }}
      serverFields={['username', 'displayName', 'email', 'role', 'password']}
      saved={(user) => `Account ${user.username} created.`}
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
    </SaveDialog>
  );
}
