import { useNavigate, useSearchParams } from 'react-router';
import { safeReturnPath } from '../../config/paths';
import { SignInForm } from '../../features/auth/components/sign-in-form';

export function SignInRoute() {
  const [searchParams] = useSearchParams();
  const navigate = useNavigate();
  const next = safeReturnPath(searchParams.get('next'));

  return (
    <main id="main" className="flex min-h-dvh flex-col items-center justify-center px-4 py-10">
      <title>Sign in · Asepta</title>
      <div className="w-full max-w-sm">
        <div className="mb-6 flex items-center gap-3 text-accent-strong">
          <svg viewBox="0 0 32 32" width="40" height="40" aria-hidden="true">
            <circle cx="16" cy="16" r="12" fill="none" stroke="currentColor" strokeWidth="4" />
            <circle cx="16" cy="16" r="4" fill="currentColor" />
          </svg>
          <div>
            <p className="text-2xl font-bold">Asepta</p>
            <p className="text-muted">Contamination register for the spawn lab</p>
          </div>
        </div>
        <div className="rounded-xl border border-line bg-surface-raised p-6 shadow-raised">
          <h1 className="mb-4 text-xl font-semibold">Sign in</h1>
          <SignInForm onSignedIn={() => void navigate(next, { replace: true })} />
        </div>
        <p className="mt-4 text-sm text-muted">
          Forgotten your password? Ask your lab’s administrator to set a new one for you.
        </p>
      </div>
    </main>
  );
}
