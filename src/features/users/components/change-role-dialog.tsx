import { useId } from 'react';
import { z } from 'zod';
import { roleSchema } from '../../../../shared/enums';
import type { UserDto } from '../../../../shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { Notice } from '../../../components/ui/notice';
import { Select } from '../../../components/ui/select';
import { useToast } from '../../../components/ui/toast';
import { roleLabels } from '../../../config/roles';
import { useUpdateUser } from '../api/use-update-user';
import { roleOptions } from './role-options';

const formSchema = z.object({ role: roleSchema });

export function ChangeRoleDialog({ user, onClose }: { user: UserDto | undefined; onClose: () => void }) {
  const formId = useId();
  const updateUser = useUpdateUser();
  const toast = useToast();

  return (
    <Dialog
      open={Boolean(user)}
      onClose={onClose}
      busy={updateUser.isPending}
      size="sm"
      title="Change role"
      description={user && `${user.displayName} (${user.username}), currently ${roleLabels[user.role].toLowerCase()}.`}
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={updateUser.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={updateUser.isPending}>
            Save role
          </Button>
        </>
      }
    >
      {user && (
        <Form
          id={formId}
          schema={formSchema}
          options={{ defaultValues: { role: user.role } }}
          onSubmit={async ({ role }, { setError }) => {
            if (role === user.role) return onClose();
            try {
              await updateUser.mutateAsync({ id: user.id, input: { role } });
              toast.success(`${user.displayName} is now ${roleLabels[role].toLowerCase()}.`);
              onClose();
            } catch (error) {
              applyServerErrors(error, setError, ['role']);
            }
          }}
        >
          {({ register, watch }) => (
            <>
              <Select label="New role" options={roleOptions} {...register('role')} />
              {watch('role') === 'admin' && user.role !== 'admin' && (
                <Notice tone="warn">
                  Administrators manage every account and the lab’s settings. Give this role only to people who need it.
                </Notice>
              )}
            </>
          )}
        </Form>
      )}
    </Dialog>
  );
}
