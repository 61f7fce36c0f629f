import { SentMailScreen } from '../../features/mail/components/sent-mail-screen';

export function SentMailRoute() {
  return (
    <>
      <title>Sent mail · Asepta</title>
      <SentMailScreen />
    </>
  );
}
