import type { MeDto } from '../../../../shared/schemas/auth';
import { loginSchema } from '../../../../shared/schemas/auth';
import { Button } from '../../../components/ui/button';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { PasswordField, UsernameField } from '../../../components/ui/form-fields';
import { isApiError } from '../../../lib/api-client';
import { useSignIn } from '../api/use-sign-in';

const failures: Record<number, string> = {
  401: 'Username or password is wrong.',
  429: 'Too many failed sign-ins. Wait 15 minutes and try again.',
};

export function SignInForm({ onSignedIn }: { onSignedIn: (me: MeDto) => void }) {
  const signIn = useSignIn();

  return (
    <Form
      schema={loginSchema}
      options={{ defaultValues: { username: '', password: '' } }}
      onSubmit={async (values, { setError, resetField, setFocus }) => {
        try {
          onSignedIn(await signIn.mutateAsync(values));
        } catch (error) {
          const known = isApiError(error) ? failures[error.status] : undefined;
          if (known) {
            setError('root.server', { type: 'server', message: known });
            resetField('password');
            setFocus('password');
          } else {
            applyServerErrors(error, setError, ['username', 'password']);
          }
        }
      }}
    >
      {(form) => (
        <>
          <UsernameField form={form} name="username" autoComplete="username" />
          <PasswordField form={form} name="password" label="Password" autoComplete="current-password" />
          <Button type="submit" pending={signIn.isPending} className="w-full">
            Sign in
          </Button>
        </>
      )}
    </Form>
  );
}
