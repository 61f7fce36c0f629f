import { createUserSchema } from '../../../../shared/schemas/users';
import { FormDialog } from '../../../components/ui/form-dialog';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
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
      {({ register, formState: { errors } }) => (
        <>
          <TextInput
            label="Name"
            hint="As colleagues know them; shown on records they make."
            autoComplete="off"
            error={errors.displayName?.message}
            {...register('displayName')}
          />
          <TextInput
            label="Username"
            hint="Lower-case letters, digits, dot, dash or underscore. It cannot be changed later."
            autoCapitalize="none"
            autoCorrect="off"
            spellCheck={false}
            autoComplete="off"
            error={errors.username?.message}
            {...register('username')}
          />
          <TextInput
            label="E-mail"
            type="email"
            optional
            hint="Needed for alerts and digests."
            autoComplete="off"
            error={errors.email?.message}
            {...register('email')}
          />
          <Select label="Role" options={roleOptions} error={errors.role?.message} {...register('role')} />
          <TextInput
            label="First password"
            type="password"
            autoComplete="new-password"
            hint="At least 10 characters. Give it to them in person and ask them to change it from Account."
            error={errors.password?.message}
            {...register('password')}
          />
        </>
      )}
    </FormDialog>
  );
}
