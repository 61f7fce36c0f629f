import { z } from 'zod';
import { changePasswordSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { PasswordField } from '../../../components/ui/form-fields';
import { useToast } from '../../../components/ui/toast';
import { useChangePassword } from '../api/use-change-password';

const formSchema = changePasswordSchema
  .extend({ confirmPassword: z.string().min(1, 'type the new password again') })
  .refine((v) => v.newPassword === v.confirmPassword, {
    path: ['confirmPassword'],
    message: 'the two new passwords differ',
  })
  .refine((v) => v.newPassword !== v.currentPassword, {
    path: ['newPassword'],
    message: 'choose a password that differs from the current one',
  });

const empty = { currentPassword: '', newPassword: '', confirmPassword: '' };

interface Props {
  /** Label of the current password: after an admin's reset it is the temporary one. */
  currentLabel?: string;
  onChanged?: () => void;
}

export function ChangePasswordForm({ currentLabel = 'Current password', onChanged }: Props) {
  const changePassword = useChangePassword();
  const toast = useToast();

  return (
    <Form
      schema={formSchema}
      options={{ defaultValues: empty }}
      className="max-w-md"
      onSubmit={async ({ currentPassword, newPassword }, { setError, reset }) => {
        try {
          await changePassword.mutateAsync({ currentPassword, newPassword });
          reset(empty);
          toast.success('Your password is changed. Use the new one next time you sign in.');
          onChanged?.();
        } catch (error) {
          applyServerErrors(error, setError, ['currentPassword', 'newPassword']);
        }
      }}
    >
      {(form) => (
        <>
          <PasswordField form={form} name="currentPassword" label={currentLabel} autoComplete="current-password" />
          <PasswordField
            form={form}
            name="newPassword"
            label="New password"
            autoComplete="new-password"
            hint="At least 10 characters. A short sentence is easier to type with gloves than a jumble of symbols."
          />
          <PasswordField form={form} name="confirmPassword" label="New password again" autoComplete="new-password" />
          <div>
            <Button type="submit" pending={changePassword.isPending}>
              Change password
            </Button>
          </div>
        </>
      )}
    </Form>
  );
}
