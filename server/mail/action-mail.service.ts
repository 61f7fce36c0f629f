import { config } from '../core/config';
import { todayLocal } from '../core/local-time';
import { logger } from '../core/logger';
import { actionMailRepository, type ActionMailRow } from './action-mail.repository';
import { actionAssignedMail, actionOverdueMail } from './action-mail-templates';
import { mailRepository, type Recipient } from './mail.repository';
import { deliver, type DeliveryResult } from './mailer';
import { withNamedLock } from './named-lock';
import type { MailKind } from '../../shared/enums';

const REMINDER_LOCK = 'asepta-action-reminders';

/** A user owner at their account's address (unless they turned the kind off); staff at the address on the action. */
async function ownerRecipient(kind: MailKind, a: ActionMailRow): Promise<Recipient | null> {
  if (a.ownerId !== null) return (await mailRepository.recipients(kind, [], a.ownerId))[0] ?? null;
  return a.ownerEmail ? { userId: null, displayName: a.ownerName, email: a.ownerEmail } : null;
}

const facts = (a: ActionMailRow) => ({
  actionId: a.id,
  incidentId: a.incidentId,
  what: a.what,
  ownerName: a.ownerName,
  dueOn: a.dueOn,
  url: `${config().publicUrl}/incidents/${a.incidentId}#action-${a.id}`,
});

/** After the assignment has committed; a mail failure is recorded, never thrown at the caller. */
export async function notifyActionAssigned(actionId: number): Promise<DeliveryResult> {
  try {
    const action = await actionMailRepository.find(actionId);
    const to = action && (await ownerRecipient('action-assigned', action));
    if (!action || !to) return { sent: 0, failed: 0 };
    const result = await deliver('action-assigned', [to], actionAssignedMail(facts(action)));
    if (result.sent) await actionMailRepository.markAssigned(actionId);
    return result;
  } catch (err) {
    logger.error({ err, actionId }, 'action assignment mail failed');
    return { sent: 0, failed: 1 };
  }
}

/**
 * One reminder per overdue action across every instance: the named lock keeps two senders apart and
 * the claimed overdueMailAt keeps a later run from repeating it. An owner without an address is not
 * mailed, but the reminder still counts as given.
 */
export async function sendOverdueReminders(today = todayLocal()): Promise<{ reminded: number; failed: number }> {
  const result = await withNamedLock(REMINDER_LOCK, 0, async (m) => {
    const out = { reminded: 0, failed: 0 };
    for (const action of await actionMailRepository.overdue(m, today)) {
      if (!(await actionMailRepository.claimOverdue(m, action.id))) continue;
      const to = await ownerRecipient('action-overdue', action);
      if (!to) continue;
      const d = await deliver('action-overdue', [to], actionOverdueMail(facts(action)));
      out.reminded += d.sent;
      out.failed += d.failed;
    }
    return out;
  });
  return result ?? { reminded: 0, failed: 0 };
}
