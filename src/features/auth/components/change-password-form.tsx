import { z } from 'zod';
import { changePasswordSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
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
      {({ register, formState: { errors } }) => (
        <>
          <TextInput
            label={currentLabel}
            type="password"
            autoComplete="current-password"
            error={errors.currentPassword?.message}
            {...register('currentPassword')}
          />
          <TextInput
            label="New password"
            type="password"
            autoComplete="new-password"
            hint="At least 10 characters. A short sentence is easier to type with gloves than a jumble of symbols."
            error={errors.newPassword?.message}
            {...register('newPassword')}
          />
          <TextInput
            label="New password again"
            type="password"
            autoComplete="new-password"
            error={errors.confirmPassword?.message}
            {...register('confirmPassword')}
          />
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
