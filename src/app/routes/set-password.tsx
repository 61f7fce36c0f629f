import { useQueryClient } from '@tanstack/react-query';
import { useNavigate } from 'react-router';
import { Button } from '../../components/ui/button';
import { paths } from '../../config/paths';
import { authQueries } from '../../features/auth/api/auth-queries';
import { useSignOut } from '../../features/auth/api/use-sign-out';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form';

/** After an admin's reset: the only screen open until the person sets a password of their own. */
export function SetPasswordRoute() {
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const signOut = useSignOut();

  return (
    <main id="main" className="flex min-h-dvh flex-col items-center justify-center px-4 py-10">
      <title>Set a new password · Asepta</title>
      <div className="w-full max-w-md rounded-xl border border-line bg-surface-raised p-6 shadow-raised">
        <h1 className="mb-2 text-xl font-semibold">Set a new password</h1>
        <p className="mb-4 text-muted">
          An administrator reset your password. Type the temporary password you were given, then choose one only you
          know. The rest of Asepta opens once it is set.
        </p>
        <ChangePasswordForm
          currentLabel="Temporary password"
          onChanged={() => {
            // Set, not invalidated: no screen here watches the query, so it would not refetch before the guard reads it.
            queryClient.setQueryData(authQueries.me().queryKey, (me) => me && { ...me, mustChangePassword: false });
            void navigate(paths.home.to(), { replace: true });
          }}
        />
        <div className="mt-4 border-t border-line pt-4">
          <Button variant="secondary" pending={signOut.isPending} onClick={() => signOut.mutate()}>
            Sign out
          </Button>
        </div>
      </div>
    </main>
  );
}
