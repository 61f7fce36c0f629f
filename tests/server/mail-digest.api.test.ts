import { beforeAll, describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { DigestRun } from '../../server/mail/digest-run.entity';
import { startDigestScheduler } from '../../server/mail/digest-scheduler';
import { buildDigestFacts, isDigestTime, sendWeeklyDigest } from '../../server/mail/digest.service';
import { isoWeekOf, labClock, weeksEndingAt } from '../../server/core/calendar';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeIncident, makeJars } from '../setup/lab-rows';
import { mailsTo } from '../setup/mail-sink';
import { digestResultSchema } from '../../shared/schemas/mail';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();

describe('ISO weeks', () => {
  it('labels weeks by the ISO week-year', () => {
    // DESIGN.md §3, after ISO 8601-1:2019 §5.2.4: 2027-01-01 falls in 2026-W53.
    expect(isoWeekOf('2027-01-01')).toBe('2026-W53');
    // ISO 8601:2004 §4.1.4 example (from memory): 1985-04-12 is 1985-W15-5.
    expect(isoWeekOf('1985-04-12')).toBe('1985-W15');
    // ISO 8601: week 01 is the week holding the year's first Thursday, so 2008-12-29 (a Monday) is 2009-W01 [from memory].
    expect(isoWeekOf('2008-12-29')).toBe('2009-W01');
    expect(weeksEndingAt('2027-01-03', 2)).toEqual([
      { week: '2026-W52', monday: '2026-12-21' },
      { week: '2026-W53', monday: '2026-12-28' },
    ]);
  });

  it('reads the lab clock in its own time zone', () => {
    // Europe/London is on GMT in March and on BST (UTC+1) in June 2041 — the EU/UK rule: last Sunday of March.
    expect(labClock(new Date('2041-03-11T06:59:00Z'), 'Europe/London')).toEqual({
      date: '2041-03-11',
      weekday: 1,
      hour: 6,
    });
    expect(labClock(new Date('2041-06-03T06:00:00Z'), 'Europe/London')).toEqual({
      date: '2041-06-03',
      weekday: 1,
      hour: 7,
    });
    expect(isDigestTime(new Date('2041-03-11T06:59:00Z'))).toBe(false);
    expect(isDigestTime(new Date('2041-03-11T07:00:00Z'))).toBe(true);
    expect(isDigestTime(new Date('2041-06-03T05:59:00Z'))).toBe(false);
    expect(isDigestTime(new Date('2041-06-03T06:00:00Z'))).toBe(true);
    expect(isDigestTime(new Date('2041-03-12T09:00:00Z'))).toBe(false);
  });
});

describe('weekly digest', () => {
  // Monday 2041-03-11 07:05 in London; the digest reports the eight weeks up to Sunday 2041-03-10.
  const monday = new Date('2041-03-11T07:05:00Z');

  beforeAll(async () => {
    await dataSource.manager.clear(DigestRun);
    const contaminate = async (jars: Awaited<ReturnType<typeof makeJars>>, n: number) => {
      for (const j of jars.slice(0, n)) await makeIncident([j], { foundOn: '2041-03-06', contaminant: 'trichoderma' });
    };
    await contaminate(await makeJars(20, { inoculatedOn: '2041-01-15' }), 1);
    await contaminate(await makeJars(20, { inoculatedOn: '2041-01-29' }), 2);
    await contaminate(await makeJars(20, { inoculatedOn: '2041-02-05' }), 12);
    await contaminate(await makeJars(2, { inoculatedOn: '2041-03-05', grain: 'rye' }), 1);
    await makeJars(2, { inoculatedOn: '2041-03-07', grain: 'sorghum' });
  });

  it('builds the weekly numbers with p-chart flags', async () => {
    const facts = await buildDigestFacts('2041-03-11');
    expect(facts.reportWeek).toBe('2041-W10');
    expect(facts.weeks.map((w) => w.week)).toEqual([
      '2041-W03',
      '2041-W04',
      '2041-W05',
      '2041-W06',
      '2041-W07',
      '2041-W08',
      '2041-W09',
      '2041-W10',
    ]);
    const byWeek = Object.fromEntries(facts.weeks.map((w) => [w.week, w]));
    expect(byWeek['2041-W03']).toEqual({
      week: '2041-W03',
      jars: 20,
      contaminated: 1,
      incubating: 0,
      rate: 0.05,
      provisional: false,
      outOfControl: false,
    });
    expect(byWeek['2041-W06']).toMatchObject({ jars: 20, contaminated: 12, rate: 0.6, outOfControl: true });
    expect(byWeek['2041-W10']).toEqual({
      week: '2041-W10',
      jars: 4,
      contaminated: 1,
      incubating: 3,
      rate: 0.25,
      provisional: true,
      outOfControl: false,
    });
    // Montgomery, Introduction to Statistical Quality Control, ch. 7: p̄ = Σx/Σn over the settled weeks = 15/60;
    // UCL for n = 20 is 0.25 + 3·√(0.25·0.75/20) = 0.5405, so 12/20 = 0.6 is out of control.
    expect(facts.pBar).toBeCloseTo(0.25, 12);
    expect(facts.grains).toEqual([
      { grain: 'rye', jars: 2, contaminated: 1, rate: 0.5 },
      { grain: 'sorghum', jars: 2, contaminated: 0, rate: 0 },
    ]);
  });

  it('sends once per ISO week on the schedule, to the roles that read the table, except who opted out', async () => {
    const sup = await signedIn(app, 'supervisor');
    const trainer = await signedIn(app, 'trainer');
    const quiet = await signedIn(app, 'admin');
    const tech = await signedIn(app, 'technician');
    await quiet.agent
      .put('/api/mail/preferences')
      .set('X-CSRF-Token', quiet.token())
      .send({ 'weekly-digest': false })
      .expect(200);

    const scheduler = startDigestScheduler(60 * 60_000);
    try {
      await scheduler.tick(new Date('2041-03-11T06:30:00Z'));
      expect(await dataSource.manager.countBy(DigestRun, { isoWeek: '2041-W11' })).toBe(0);
      // Two instances ticking at once: GET_LOCK and the unique week let one of them send.
      const [a, b] = await Promise.all([
        sendWeeklyDigest({ now: monday, trigger: 'schedule' }),
        sendWeeklyDigest({ now: monday, trigger: 'schedule' }),
      ]);
      expect([a.skipped, b.skipped].sort()).toEqual([false, true]);
      await scheduler.tick(new Date('2041-03-11T08:00:00Z'));
    } finally {
      scheduler.stop();
    }
    const run = await dataSource.manager.findOneByOrFail(DigestRun, { isoWeek: '2041-W11' });
    expect(run.trigger).toBe('schedule');
    expect(run.finishedAt).not.toBeNull();

    const subject = 'Weekly contamination digest: 2041-W10';
    expect(mailsTo(sup.user.email!).filter((m) => m.subject === subject)).toHaveLength(1);
    expect(mailsTo(trainer.user.email!).filter((m) => m.subject === subject)).toHaveLength(1);
    expect(mailsTo(quiet.user.email!).filter((m) => m.subject === subject)).toHaveLength(0);
    expect(mailsTo(tech.user.email!).filter((m) => m.subject === subject)).toHaveLength(0);

    const mail = mailsTo(sup.user.email!).find((m) => m.subject === subject)!;
    expect(mail.kind).toBe('weekly-digest');
    expect(mail.text).toContain('Week 2041-W10: 4 jars inoculated, 1 contaminated (25.0 %), 3 still incubating.');
    expect(mail.text).toMatch(/2041-W03\s+20\s+1\s+0\s+5\.0 %/);
    expect(mail.text).toMatch(/2041-W06\s+20\s+12\s+0\s+60\.0 %\s+OUT OF CONTROL/);
    expect(mail.text).toMatch(/2041-W10\s+4\s+1\s+3\s+25\.0 %\s+provisional/);
    expect(mail.text).toContain('Centre line p̄ over settled weeks: 25.0 %.');
    expect(mail.text).toMatch(/sorghum\s+2\s+0\s+0\.0 %/);
    expect(mail.html).toContain('<td style="border:1px solid #c9cfc7;padding:4px 8px;text-align:right">60.0 %</td>');
  });

  it('sends a manual digest even when the week is done', async () => {
    const sup = await signedIn(app, 'supervisor');
    const result = await sendWeeklyDigest({ now: monday, trigger: 'manual' });
    expect(result).toMatchObject({ week: '2041-W10', skipped: false, failed: 0 });
    expect(result.sent).toBeGreaterThan(0);
    expect(mailsTo(sup.user.email!).filter((m) => m.subject === 'Weekly contamination digest: 2041-W10')).toHaveLength(
      1,
    );
  });

  it('lets an admin send the digest now from the API', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent.post('/api/mail/digest').set('X-CSRF-Token', admin.token());
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ skipped: false, failed: 0 });
    const { week } = bodyOf(res, digestResultSchema);
    expect(week).toMatch(/^\d{4}-W\d{2}$/);
    expect(mailsTo(admin.user.email!).filter((m) => m.subject === `Weekly contamination digest: ${week}`)).toHaveLength(
      1,
    );
  });
});
