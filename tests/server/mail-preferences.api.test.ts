import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { optOut } from './mail.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';
import { mailPreferencesSchema } from '../../shared/schemas/mail';

const app = createTestApp();

describe('/api/mail/preferences', () => {
  it('answers 401 without a session', async () => {
    expect((await supertest(app).get('/api/mail/preferences')).status).toBe(401);
  });

  it('starts with every kind on, saves a change with an audit event, and names a bad field', async () => {
    const tech = await signedIn(app, 'technician');
    const initial = await tech.agent.get('/api/mail/preferences').expect(200);
    expect(initial.body).toEqual({
      'new-incident': true,
      'cluster-alert': true,
      retraining: true,
      'weekly-digest': true,
      'action-assigned': true,
      'action-overdue': true,
    });
    const res = await optOut(tech, { 'weekly-digest': false });
    expect(bodyOf(res, mailPreferencesSchema)['weekly-digest']).toBe(false);
    expect(bodyOf(await tech.agent.get('/api/mail/preferences'), mailPreferencesSchema)['weekly-digest']).toBe(false);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'user',
      recordId: String(tech.user.id),
      field: 'mail:weekly-digest',
    });
    expect(audit).toMatchObject({ oldValue: 'true', newValue: 'false' });

    const bad = await tech.agent
      .put('/api/mail/preferences')
      .set('X-CSRF-Token', tech.token())
      .send({ retraining: 'no' });
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('retraining');
    const unknown = await tech.agent.put('/api/mail/preferences').set('X-CSRF-Token', tech.token()).send({ sms: true });
    expect(unknown.status).toBe(400);
  });
});
