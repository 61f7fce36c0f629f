import type { Page } from '../../shared/schemas/common';
import {
  type MailPreferencesDto,
  type SentMailDetailDto,
  type SentMailDto,
  type SentMailListQuery,
  type UpdateMailPreferencesInput,
} from '../../shared/schemas/mail';
import { recordAudit, type Actor } from '../audit/audit.service';
import { notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import { mailRepository } from './mail.repository';
import type { SentMail } from './sent-mail.entity';
import { mailKinds } from '../../shared/enums';

export async function getMailPreferences(userId: number): Promise<MailPreferencesDto> {
  const rows = await mailRepository.preferences(userId);
  const prefs = Object.fromEntries(mailKinds.map((k) => [k, true])) as MailPreferencesDto;
  for (const r of rows) prefs[r.kind] = r.enabled;
  return prefs;
}

export async function updateMailPreferences(
  actor: Actor & { id: number },
  input: UpdateMailPreferencesInput,
): Promise<MailPreferencesDto> {
  const before = await getMailPreferences(actor.id);
  const changes = mailKinds.flatMap((k) => {
    const next = input[k];
    return next === undefined || next === before[k] ? [] : [[k, next] as [typeof k, boolean]];
  });
  await dataSource.transaction(async (m) => {
    await mailRepository.savePreferences(m, actor.id, changes);
    await recordAudit(
      m,
      actor,
      changes.map(([kind, enabled]) => ({
        action: 'mail-preference',
        recordType: 'user',
        recordId: actor.id,
        field: `mail:${kind}`,
        oldValue: before[kind],
        newValue: enabled,
      })),
    );
  });
  return getMailPreferences(actor.id);
}

const toSentMailDto = (m: SentMail): SentMailDto => ({
  id: m.id,
  kind: m.kind,
  to: m.toAddress,
  toUserId: m.toUserId,
  subject: m.subject,
  status: m.status,
  error: m.error,
  createdAt: m.createdAt.toISOString(),
});

export async function listSentMail(q: SentMailListQuery): Promise<Page<SentMailDto>> {
  const [rows, total] = await mailRepository.listSent(q);
  return pageResult(rows.map(toSentMailDto), total, q);
}

export async function getSentMail(id: number): Promise<SentMailDetailDto> {
  const row = await mailRepository.findSent(id);
  if (!row) throw notFound('Sent mail');
  return { ...toSentMailDto(row), text: row.textBody };
}
