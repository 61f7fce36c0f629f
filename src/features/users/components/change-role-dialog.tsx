import { z } from 'zod';
import { roleSchema } from '../../../../shared/enums';
import type { UserDto } from '../../../../shared/schemas/users';
import { FormDialog } from '../../../components/ui/form-dialog';
import { Notice } from '../../../components/ui/notice';
import { Select } from '../../../components/ui/select';
import { useToast } from '../../../components/ui/toast';
import { roleLabels } from '../../../config/roles';
import { useUpdateUser } from '../api/use-update-user';
import { roleOptions } from './role-options';

const formSchema = z.object({ role: roleSchema });

export function ChangeRoleDialog({ user, onClose }: { user: UserDto | undefined; onClose: () => void }) {
  const updateUser = useUpdateUser();
  const toast = useToast();

  return (
    <FormDialog
      open={Boolean(user)}
      onClose={onClose}
      pending={updateUser.isPending}
      size="sm"
      title="Change role"
      description={user && `${user.displayName} (${user.username}), currently ${roleLabels[user.role].toLowerCase()}.`}
      submitLabel="Save role"
      schema={formSchema}
      options={{ defaultValues: { role: user?.role } }}
      serverFields={['role']}
      onSubmit={async ({ role }) => {
        if (!user) return;
        if (role === user.role) return onClose();
        await updateUser.mutateAsync({ id: user.id, input: { role } });
        toast.success(`${user.displayName} is now ${roleLabels[role].toLowerCase()}.`);
        onClose();
      }}
    >
      {({ register, watch }) => (
        <>
          <Select label="New role" options={roleOptions} {...register('role')} />
          {watch('role') === 'admin' && user?.role !== 'admin' && (
            <Notice tone="warn">
              Administrators manage every account and the lab’s settings. Give this role only to people who need it.
            </Notice>
          )}
        </>
      )}
    </FormDialog>
  );
}
