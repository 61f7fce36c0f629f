import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setLabTimeZone } from '../../src/lib/format';
import { entry, read } from './history-text.fixtures';

describe('describeHistoryEntry', () => {
  // Europe/Amsterdam is UTC+1 in November (IANA time zone database); Intl (ICU) applies it.
  beforeAll(() => setLabTimeZone('Europe/Amsterdam'));
  afterAll(() => setLabTimeZone(undefined));

  it('shows the time on the lab clock, not UTC', () => {
    expect(read(entry({ action: 'review', recordType: 'incident' })).when).toBe('Nov 3, 2026, 10:15 AM');
  });

  it('incident create: names the finding, counts photos, leaves out blanks', () => {
    const l = read(
      entry({
        action: 'create',
        recordType: 'incident',
        newValue: {
          contaminant: 'trichoderma',
          severity: 'high',
          stage: 'incubation',
          foundAt: '2026-11-03T08:00:00.000Z',
          jars: ['R-0412', 'R-0413'],
          photos: [31, 44],
          notes: null,
        },
      }),
    );
    expect(l.what).toBe('Reported the incident');
    expect(l.details).toContain('Jars: R-0412, R-0413');
    expect(l.details).toContain('Photos: 2');
    expect(l.details).toContain('Found at: Nov 3, 2026, 9:00 AM');
    expect(l.all).not.toMatch(/Notes/);
  });

  it('add-photo: the photo by its place on the incident, no id', () => {
    const l = read(entry({ action: 'add-photo', recordType: 'incident', field: 'photos', newValue: 44 }));
    expect(l.what).toBe('Added a photo (photo 2 of 3)');
    expect(l.details).toEqual([]);
    expect(l.all).not.toMatch(/44/);
  });

  it('review and update: field, old and new by their names', () => {
    const review = read(
      entry({ action: 'review', recordType: 'incident', field: 'verdict', oldValue: 'pending', newValue: 'confirmed' }),
    );
    expect(review.details).toEqual(['Verdict: Pending → Confirmed']);
    const update = read(
      entry({ action: 'update', recordType: 'incident', field: 'notes', oldValue: null, newValue: 'Lid loose' }),
    );
    expect(update.details).toEqual(['Notes set to Lid loose']);
  });

  it('void: the headline and the reason, no "yes/no" line', () => {
    const l = read(
      entry({
        action: 'void',
        recordType: 'incident',
        field: 'voided',
        oldValue: false,
        newValue: true,
        reason: 'Wrong jar',
      }),
    );
    expect(l).toMatchObject({ what: 'Voided the incident', details: [], reason: 'Wrong jar' });
  });

  it('link-step and unlink-step: step, procedure and version; the note as a note', () => {
    const link = { linkId: 3, stepId: 12, procedure: 'Sterile technique', version: 2, position: 3 };
    const l = read(
      entry({ action: 'link-step', recordType: 'incident', field: 'procedureStep', newValue: link, reason: 'Skipped' }),
    );
    expect(l.what).toBe('Linked to step 3 of Sterile technique (version 2)');
    expect(l.reasonLabel).toBe('Note');
    const u = read(
      entry({
        action: 'unlink-step',
        recordType: 'incident',
        field: 'procedureStep',
        oldValue: { ...link, note: 'x' },
      }),
    );
    expect(u.what).toBe('Unlinked from step 3 of Sterile technique (version 2)');
  });

  it('corrective action create and update: its title and owner, due date as a date, no blank factor', () => {
    const c = read(
      entry({
        action: 'create',
        recordType: 'corrective-action',
        recordId: 9,
        newValue: {
          incidentId: 7,
          what: 'Re-train',
          owner: 'Tom Adebayo',
          dueOn: '2026-11-10',
          factor: null,
          level: null,
        },
      }),
    );
    expect(c.what).toBe('Added the corrective action “Re-train” for Tom Adebayo');
    expect(c.details).toEqual(['Action: Re-train', 'Owner: Tom Adebayo', 'Due: Nov 10, 2026']);
    const u = read(
      entry({
        action: 'update',
        recordType: 'corrective-action',
        recordId: 9,
        field: 'factor',
        oldValue: null,
        newValue: 'cookMinutes',
      }),
    );
    expect(u.what).toBe('Changed the corrective action “Re-train on flame sterilising” (owner Tom Adebayo)');
    expect(u.details).toEqual(['Factor set to minutes at pressure']);
  });
});
