import { dataSource } from '../../server/db/data-source';
import type { signedIn } from '../setup/factories';

export type Client = Awaited<ReturnType<typeof signedIn>>;

/** Saves mail preferences for the client; each kind named false is turned off. */
export const optOut = (client: Client, body: Record<string, boolean>) =>
  client.agent.put('/api/mail/preferences').set('X-CSRF-Token', client.token()).send(body).expect(200);

/** Who should get a kind right now: active, addressed, in the roles, not opted out. */
export async function eligible(kind: string, roles: string[]): Promise<string[]> {
  const rows: { email: string }[] = await dataSource.query(
    `SELECT u.email AS email FROM users u LEFT JOIN mail_preferences p ON p.userId = u.id AND p.kind = ?
     WHERE u.active = 1 AND u.email IS NOT NULL AND u.email <> '' AND u.role IN (?) AND COALESCE(p.enabled, 1) = 1`,
    [kind, roles],
  );
  return rows.map((r) => r.email.toLowerCase()).sort();
}
