import { OutboxScreen } from '../../features/outbox/components/outbox-screen';

export function OutboxRoute() {
  return (
    <>
      <title>Waiting to send · Asepta</title>
      <OutboxScreen />
    </>
  );
}
