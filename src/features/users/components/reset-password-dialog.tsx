import { useState } from 'react';
import { resetPasswordSchema, type UserDto } from '../../../../shared/schemas/users';
import { TextField } from '../../../components/ui/form-fields';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { FormDialog } from '../../../components/ui/form-dialog';
import { useToast } from '../../../components/ui/toast';
import { useResetPassword } from '../api/use-reset-password';

interface Props {
  user: UserDto | undefined;
  onClose: () => void;
}

/** The admin types a temporary password or leaves it to the server; a made one is shown here once. */
export function ResetPasswordDialog({ user, onClose }: Props) {
  const reset = useResetPassword();
  const toast = useToast();
  const [shown, setShown] = useState<{ name: string; password: string } | null>(null);

  if (shown) {
    return (
      <Dialog
        open
        onClose={() => setShown(null)}
        title={`New password for ${shown.name}`}
        size="sm"
        footer={
          <Button onClick={() => setShown(null)} data-autofocus>
            Done
          </Button>
        }
      >
        <div className="space-y-3">
          <p>Give this password to {shown.name} in person or by phone. It is shown only now.</p>
          <p>
            Temporary password:{' '}
            <code className="block rounded-lg border border-line bg-surface px-3 py-2 text-xl tracking-wider break-all">
              {shown.password}
            </code>
          </p>
          <p className="text-muted">They will choose their own password when they next sign in.</p>
        </div>
      </Dialog>
    );
  }

  return (
    <FormDialog
      open={Boolean(user)}
      onClose={onClose}
      pending={reset.isPending}
      size="sm"
      title={`Reset ${user?.displayName ?? ''}’s password?`}
      description="They are signed out everywhere and must set a new password at their next sign-in."
      submitLabel="Reset password"
      submitVariant="danger"
      focusCancel
      schema={resetPasswordSchema}
      formKey={user ? String(user.id) : undefined}
      options={{ defaultValues: { temporaryPassword: '' } }}
      serverFields={['temporaryPassword']}
      onSubmit={async (input) => {
        if (!user) return;
        const result = await reset.mutateAsync({ id: user.id, input });
        onClose();
        if (result.generatedPassword) setShown({ name: user.displayName, password: result.generatedPassword });
        else toast.success(`${user.displayName} must change the temporary password at next sign-in.`);
      }}
    >
      {(form) => (
        <TextField
          form={form}
          name="temporaryPassword"
          label="Temporary password (optional)"
          autoComplete="off"
          hint="At least 10 characters. Leave empty and Asepta makes one for you."
        />
      )}
    </FormDialog>
  );
}
