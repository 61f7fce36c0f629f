import { useCurrentUser } from '../../features/auth/api/use-me';
import { MailPreferencesScreen } from '../../features/mail/components/mail-preferences-screen';

export function MailPreferencesRoute() {
  const me = useCurrentUser();
  return (
    <>
      <title>Mail · Asepta</title>
      <MailPreferencesScreen role={me.role} hasEmail={Boolean(me.email)} />
    </>
  );
}
