import type { UserDto } from '../../../../shared/schemas/users';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useUpdateUser } from '../api/use-update-user';

/** Accounts are never deleted: records keep pointing at the person who made them. */
export function SetActiveDialog({ user, onClose }: { user: UserDto | undefined; onClose: () => void }) {
  const updateUser = useUpdateUser();
  const toast = useToast();
  // While saving, the refreshed list may already show the new state; keep the wording of the request.
  const deactivating = updateUser.variables ? updateUser.variables.input.active === false : (user?.active ?? true);

  const close = () => {
    updateUser.reset();
    onClose();
  };

  const confirm = () => {
    if (!user) return;
    updateUser.mutate(
      { id: user.id, input: { active: !user.active } },
      {
        onSuccess: () => {
          toast.success(
            deactivating ? `${user.displayName} can no longer sign in.` : `${user.displayName} can sign in again.`,
          );
          close();
        },
      },
    );
  };

  return (
    <ConfirmDialog
      open={Boolean(user)}
      onClose={close}
      onConfirm={confirm}
      pending={updateUser.isPending}
      error={updateUser.error ? errorMessage(updateUser.error) : undefined}
      tone={deactivating ? 'danger' : 'primary'}
      title={deactivating ? `Deactivate ${user?.displayName ?? ''}?` : `Reactivate ${user?.displayName ?? ''}?`}
      confirmLabel={deactivating ? 'Deactivate' : 'Reactivate'}
    >
      {deactivating ? (
        <>
          <p>
            They will not be able to sign in. Jars, incidents and other records they made stay as they are, under their
            name.
          </p>
          <p className="text-muted">You can reactivate the account later.</p>
        </>
      ) : (
        <p>They will be able to sign in again with their existing password.</p>
      )}
    </ConfirmDialog>
  );
}
