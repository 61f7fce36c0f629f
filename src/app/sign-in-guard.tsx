import { useIsMutating, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Navigate, Outlet, redirect, useLocation, type LoaderFunctionArgs } from 'react-router';
import type { Role } from '../../shared/enums';
import { NotForYourRole } from '../components/errors/not-for-your-role';
import { AppLayout } from '../components/layouts/app-layout';
import { useToast } from '../components/ui/toast';
import { paths } from '../config/paths';
import { authQueries } from '../features/auth/api/auth-queries';
import { useCurrentUser, useMe } from '../features/auth/api/use-me';
import { signOutKey, useSignOut } from '../features/auth/api/use-sign-out';
import { settingsQueries } from '../features/settings/api/settings-queries';
import { errorMessage, isApiError } from '../lib/api-client';
import { setLabTimeZone } from '../lib/format';

const returnPath = (url: URL) => `${url.pathname}${url.search}`;

export const signedInLoader =
  (queryClient: QueryClient) =>
  async ({ request }: LoaderFunctionArgs) => {
    // Both at once: on a weak signal one more round trip is more than half a second.
    const settings = queryClient.ensureQueryData(settingsQueries.detail());
    settings.catch(() => undefined); // Signed out, it fails; the sign-in redirect below says why.
    const me = await queryClient.ensureQueryData(authQueries.me());
    if (!me) throw redirect(paths.signIn.to(returnPath(new URL(request.url))));
    // Every other route answers 403 until a reset password is replaced.
    if (me.mustChangePassword) throw redirect(paths.setPassword.to());
    // Greeting, "today" and every date on screen follow the lab's clock.
    setLabTimeZone((await settings).timeZone);
    return null;
  };

/** The signed-in area: the loader checks first; this catches a session that ends while a screen is open. */
export function SignedInLayout() {
  const { data: me } = useMe();
  const location = useLocation();
  const signOut = useSignOut();
  const toast = useToast();
  const signingOut = useIsMutating({ mutationKey: signOutKey }) > 0;

  if (!me) {
    // A deliberate sign-out starts afresh; an expired session offers to come back to this screen.
    const next = signingOut ? undefined : `${location.pathname}${location.search}`;
    return <Navigate to={paths.signIn.to(next)} replace />;
  }
  if (me.mustChangePassword) return <Navigate to={paths.setPassword.to()} replace />;

  return (
    <AppLayout
      user={me}
      signingOut={signOut.isPending}
      onSignOut={() =>
        signOut.mutate(undefined, {
          onError: (error) => {
            if (!isApiError(error, 401)) toast.error(`Could not sign out. ${errorMessage(error)}`);
          },
        })
      }
    >
      <Outlet />
    </AppLayout>
  );
}

export function RoleGate({ roles, children }: { roles: readonly Role[]; children?: ReactNode }) {
  const me = useCurrentUser();
  if (!roles.includes(me.role)) return <NotForYourRole role={me.role} allowed={roles} />;
  return children ?? <Outlet />;
}
