import { useQuery } from '@tanstack/react-query';
import { type Role, mailKinds, type MailKind } from '../../../../shared/enums';
import { mailAudience, mailKindLabels } from '../../../../shared/schemas/mail';
import { Checkbox } from '../../../components/ui/checkbox';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { errorMessage } from '../../../lib/api-client';
import { mailQueries } from '../api/mail-queries';
import { useUpdateMailPreferences } from '../api/use-mail-mutations';

const meantFor = (kind: MailKind, role: Role) => {
  const audience = mailAudience[kind];
  return audience === 'addressee' || audience.includes(role);
};

export function MailPreferencesScreen({ role, hasEmail }: { role: Role; hasEmail: boolean }) {
  const prefs = useQuery(mailQueries.preferences());
  const update = useUpdateMailPreferences();
  return (
    <>
      <PageHeader title="Mail" description="Choose which e-mails Asepta sends you. Each change is saved at once." />
      {!hasEmail && (
        <Notice tone="warn" className="mb-4">
          Your account has no e-mail address, so nothing is sent to you. An administrator can add one.
        </Notice>
      )}
      {prefs.isPending && <Spinner label="Loading your choices" />}
      {prefs.error && <Notice tone="danger">{errorMessage(prefs.error)}</Notice>}
      {update.error && (
        <Notice tone="danger" className="mb-4">
          {errorMessage(update.error)}
        </Notice>
      )}
      {prefs.data && (
        <fieldset className="flex flex-col gap-2" disabled={update.isPending}>
          <legend className="sr-only">E-mails you get</legend>
          {mailKinds.map((kind) => (
            <Checkbox
              key={kind}
              label={mailKindLabels[kind]}
              hint={meantFor(kind, role) ? undefined : 'Not sent to your role.'}
              checked={prefs.data[kind]}
              onChange={(e) => update.mutate({ [kind]: e.target.checked })}
            />
          ))}
        </fieldset>
      )}
    </>
  );
}
