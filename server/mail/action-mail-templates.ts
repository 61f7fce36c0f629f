import { mailCautions } from './mail-cautions';
import { renderMail } from './mail-layout';
import type { MailContent } from './mailer';

export interface ActionMailFacts {
  actionId: number;
  incidentId: number;
  what: string;
  ownerName: string;
  dueOn: string;
  url: string;
}

export function actionAssignedMail(f: ActionMailFacts): MailContent {
  return renderMail(`Corrective action for incident #${f.incidentId}, due ${f.dueOn}`, [
    { kind: 'p', text: `${f.ownerName}, you own corrective action ${f.actionId} on incident #${f.incidentId}:` },
    { kind: 'p', text: f.what },
    {
      kind: 'p',
      text: `It is due on ${f.dueOn}. When it is done, record how you checked that it worked.`,
    },
    { kind: 'link', label: 'Open the action', url: f.url },
    mailCautions.deferral,
  ]);
}

export function actionOverdueMail(f: ActionMailFacts): MailContent {
  return renderMail(`Overdue: corrective action for incident #${f.incidentId} (due ${f.dueOn})`, [
    {
      kind: 'p',
      text: `${f.ownerName}, corrective action ${f.actionId} on incident #${f.incidentId} was due on ${f.dueOn} and is not marked done:`,
    },
    { kind: 'p', text: f.what },
    {
      kind: 'p',
      text: 'This is the only reminder. If the date no longer fits, ask your supervisor to move it.',
    },
    { kind: 'link', label: 'Open the action', url: f.url },
  ]);
}
