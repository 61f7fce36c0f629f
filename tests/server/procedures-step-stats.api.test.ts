import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeIncident, makeJars, makeSession } from '../setup/lab-rows';
import { stepStatsSchema } from '../../shared/schemas/procedures';
import { create, stepsOf } from './procedures.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();
const statsOf = (res: { body: unknown }) => bodyOf(res, stepStatsSchema);

describe('procedures: incident–step links and step statistics', () => {
  it('compares ticked and not-ticked sessions with Fisher’s exact test', async () => {
    // Fisher R.A., The Design of Experiments (1935), the tea-tasting table [[3,1],[1,3]] as in
    // Agresti, Categorical Data Analysis (2002): two-sided p = 34/70 = 0.485714.
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [wipe, flame] = await stepsOf(trainer, proc.currentVersionId);
    const old = '2024-03-04';
    const ticked = await makeSession({
      heldOn: old,
      versionId: proc.currentVersionId,
      checks: { [wipe!.id]: true, [flame!.id]: true },
    });
    const skipped = await makeSession({
      heldOn: old,
      versionId: proc.currentVersionId,
      checks: { [wipe!.id]: true, [flame!.id]: false },
    });
    const elsewhere = await makeSession({ heldOn: old });
    const tickedJars = await makeJars(4, { inoculatedOn: old, sessionId: ticked.id });
    const skippedJars = await makeJars(4, { inoculatedOn: old, sessionId: skipped.id });
    const otherJars = await makeJars(2, { inoculatedOn: old, sessionId: elsewhere.id });
    for (const j of tickedJars.slice(0, 3)) await makeIncident([j], { foundOn: '2024-03-12' });
    await makeIncident(skippedJars.slice(0, 1), { foundOn: '2024-03-12' });
    // Neither a ruled-out nor a voided incident makes a jar contaminated (DESIGN.md §3).
    await makeIncident(skippedJars.slice(1, 2), { foundOn: '2024-03-12', verdict: 'ruled-out' });
    await makeIncident(skippedJars.slice(2, 3), { foundOn: '2024-03-12', voided: true });
    await makeIncident(otherJars, { foundOn: '2024-03-12' });

    const res = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/stats`).expect(200);
    expect(statsOf(res).ticked).toEqual({ jars: 4, contaminated: 3, incubating: 0, rate: 0.75 });
    expect(statsOf(res).notTicked).toEqual({ jars: 4, contaminated: 1, incubating: 0, rate: 0.25 });
    expect(statsOf(res).pValue).toBeCloseTo(34 / 70, 6);

    const wipeStats = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats`).expect(200);
    expect(statsOf(wipeStats).ticked).toMatchObject({ jars: 8, contaminated: 4 });
    expect(statsOf(wipeStats).notTicked).toEqual({ jars: 0, contaminated: 0, incubating: 0, rate: null });
    expect(statsOf(wipeStats).pValue).toBeNull();

    const link = await trainer.agent
      .post(`/api/incidents/${(await makeIncident(tickedJars.slice(3), { foundOn: '2024-03-13' })).id}/step-links`)
      .set('X-CSRF-Token', trainer.token())
      .send({ stepId: flame!.id, note: 'Port left wet.' });
    expect(link.status).toBe(201);
    const changed = await trainer.agent.get(`/api/procedure-steps/${flame!.id}/stats`).expect(200);
    expect(statsOf(changed).incidentsLinked).toBe(1);
    expect(statsOf(changed).ticked).toMatchObject({ jars: 4, contaminated: 4, rate: 1 });
    // Table [[4,0],[1,3]], computed here from Fisher's (1935) hypergeometric rule: the tables with these
    // margins have weights 4, 24, 24, 4 over C(8,5) = 56; the two as unlikely as observed give 8/56 = 1/7.
    expect(statsOf(changed).pValue).toBeCloseTo(1 / 7, 9);
  });

  it('counts young clean jars as incubating and filters by inoculation date', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await create(trainer);
    const [wipe] = await stepsOf(trainer, proc.currentVersionId);
    const today = new Date().toISOString().slice(0, 10);
    const recent = await makeSession({ heldOn: today, checks: { [wipe!.id]: false } });
    await makeJars(2, { inoculatedOn: today, sessionId: recent.id });
    const res = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats`).expect(200);
    expect(statsOf(res).notTicked).toEqual({ jars: 2, contaminated: 0, incubating: 2, rate: 0 });
    const none = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats?to=2020-01-01`).expect(200);
    expect(statsOf(none).notTicked.jars).toBe(0);
    const bad = await trainer.agent.get(`/api/procedure-steps/${wipe!.id}/stats?from=2024-02-30x`);
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('from');
  });
});
