import { z } from 'zod';
import { roleSchema } from '../../../../shared/enums';
import type { UserDto } from '../../../../shared/schemas/users';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { FormDialog } from '../../../components/ui/form-dialog';
import { Notice } from '../../../components/ui/notice';
import { useToast } from '../../../components/ui/toast';
import { useUpdateUser } from '../api/use-update-user';
import { roleOptions } from './role-options';

const formSchema = z.object({
  displayName: z.string().trim().min(1, 'enter a name').max(120),
  email: z.union([z.email('must be an e-mail address'), z.literal('')]),
  role: roleSchema,
});

/** Name, e-mail and role of another person's account; the username never changes. */
export function EditUserDialog({ user, onClose }: { user: UserDto | undefined; onClose: () => void }) {
  const updateUser = useUpdateUser();
  const toast = useToast();

  return (
    <FormDialog
      open={Boolean(user)}
      onClose={onClose}
      pending={updateUser.isPending}
      size="sm"
      title="Edit user"
      description={user && `Account ${user.username}. The username cannot change; every record keeps its author.`}
      submitLabel="Save changes"
      schema={formSchema}
      formKey={user ? String(user.id) : undefined}
      options={{ defaultValues: { displayName: user?.displayName ?? '', email: user?.email ?? '', role: user?.role } }}
      serverFields={['displayName', 'email', 'role']}
      onSubmit={async (values) => {
        if (!user) return;
        await updateUser.mutateAsync({ id: user.id, input: values });
        toast.success(`${values.displayName}’s account is saved.`);
        onClose();
      }}
    >
      {(form) => (
        <>
          <TextField form={form} name="displayName" label="Name" autoComplete="off" />
          <TextField
            form={form}
            name="email"
            label="E-mail"
            type="email"
            autoComplete="off"
            hint="Where mail for this person goes: actions they own, alerts, retraining. Leave empty for none."
          />
          <SelectField form={form} name="role" label="Role" options={roleOptions} />
          {form.watch('role') === 'admin' && user?.role !== 'admin' && (
            <Notice tone="warn">
              Administrators manage every account and the lab’s settings. Give this role only to people who need it.
            </Notice>
          )}
        </>
      )}
    </FormDialog>
  );
}
