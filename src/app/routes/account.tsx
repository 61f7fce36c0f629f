import { PageHeader } from '../../components/ui/page-header';
import { roleLabels } from '../../config/roles';
import { useCurrentUser } from '../../features/auth/api/use-me';
import { ChangePasswordForm } from '../../features/auth/components/change-password-form';

export function AccountRoute() {
  const me = useCurrentUser();
  const details = [
    ['Name', me.displayName],
    ['Username', me.username],
    ['E-mail', me.email ?? 'None on record'],
    ['Role', roleLabels[me.role]],
  ] as const;

  return (
    <>
      <title>Account · Asepta</title>
      <PageHeader title="Your account" description="To change your name, e-mail or role, ask an administrator." />
      <div className="grid gap-6 lg:grid-cols-2">
        <section aria-labelledby="details" className="rounded-xl border border-line bg-surface-raised p-5">
          <h2 id="details" className="mb-3 text-lg font-semibold">
            Details
          </h2>
          <dl className="divide-y divide-line">
            {details.map(([term, value]) => (
              <div key={term} className="flex flex-wrap justify-between gap-2 py-3">
                <dt className="text-muted">{term}</dt>
                <dd className="font-medium break-all">{value}</dd>
              </div>
            ))}
          </dl>
        </section>
        <section aria-labelledby="password" className="rounded-xl border border-line bg-surface-raised p-5">
          <h2 id="password" className="mb-3 text-lg font-semibold">
            Change password
          </h2>
          <ChangePasswordForm />
        </section>
      </div>
    </>
  );
}
