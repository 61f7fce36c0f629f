import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { HistoryEntryDto } from '../../shared/schemas/incident-detail';
import { describeHistoryEntry, type HistoryContext } from '../../src/features/incidents/history-text';
import { setLabTimeZone } from '../../src/lib/format';

// Every audit event kind the server writes (grep `action:` under server/), stored as recordAudit stores it:
// strings as they are, everything else as JSON.
const store = (v: unknown) => (v === undefined || v === null ? null : typeof v === 'string' ? v : JSON.stringify(v));
let n = 0;
const entry = (e: {
  action: string;
  recordType: string;
  recordId?: number;
  field?: string;
  oldValue?: unknown;
  newValue?: unknown;
  reason?: string;
}): HistoryEntryDto => ({
  id: String(++n),
  at: '2026-11-03T09:15:00.000Z',
  userName: 'Ines Varga',
  action: e.action,
  recordType: e.recordType,
  recordId: String(e.recordId ?? 7),
  field: e.field ?? null,
  oldValue: store(e.oldValue),
  newValue: store(e.newValue),
  reason: e.reason ?? null,
});

const ctx: HistoryContext = {
  photoIds: [31, 44, 52],
  actions: [{ id: 9, what: 'Re-train on flame sterilising', ownerName: 'Tom Adebayo' }],
};

const isoInstant = /\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;
const isoDay = /\b\d{4}-\d{2}-\d{2}\b/;

/** The whole line as one string, checked for what a reader must never see. */
function read(e: HistoryEntryDto) {
  const line = describeHistoryEntry(e, ctx);
  const all = [line.when, line.who, line.what, ...line.details, line.reason ?? ''].join('\n');
  expect(all).not.toMatch(isoInstant);
  expect(all).not.toMatch(isoDay);
  expect(all).not.toMatch(/[{}[\]"]/);
  expect(all).not.toMatch(/: —|: ?$|undefined|null|NaN/m);
  return { ...line, all };
}

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

  it('jar status, shelf-walk undo and jar events', () => {
    expect(
      read(
        entry({
          action: 'status',
          recordType: 'jar',
          field: 'status',
          oldValue: 'incubating',
          newValue: 'contaminated',
        }),
      ).details,
    ).toEqual(['Status: incubating → contaminated']);
    const undo = read(
      entry({
        action: 'jar-mark-undone',
        recordType: 'jar',
        field: 'event',
        oldValue: { type: 'colonised', at: '2026-11-02T10:00:00.000Z', percentColonised: 100, status: 'colonised' },
      }),
    );
    expect(undo.what).toBe('Undid a mark made on the shelf walk');
    expect(undo.details[0]).toContain('Colonised (%): 100');
    expect(read(entry({ action: 'jar-shaken', recordType: 'jar' })).what).toBe('Recorded “shaken” on a jar');
    expect(read(entry({ action: 'lineage-hold', recordType: 'culture', newValue: { held: 4 } })).details).toEqual([
      'Jars held: 4',
    ]);
  });

  it('cook runs, cultures, sessions, grain, procedures, photos and imports', () => {
    expect(
      read(entry({ action: 'create', recordType: 'cook-run', newValue: { code: 'CR-1', minutesAtPressure: 90 } }))
        .details,
    ).toEqual(['Code: CR-1', 'Minutes at pressure: 90']);
    expect(
      read(entry({ action: 'readings', recordType: 'cook-run', field: 'f0', oldValue: 41.93, newValue: 12.04 }))
        .details,
    ).toEqual(['F0 (min): 41.9 → 12.0']);
    expect(
      read(
        entry({
          action: 'state',
          recordType: 'culture',
          field: 'state',
          oldValue: 'quarantined',
          newValue: 'released',
        }),
      ).what,
    ).toBe('State of a culture changed');
    expect(
      read(
        entry({
          action: 'create',
          recordType: 'session',
          newValue: { code: 'S-1', heldOn: '2026-10-30', operator: 'A' },
        }),
      ).details,
    ).toEqual(['Code: S-1', 'Held on: Oct 30, 2026', 'Operator: A']);
    expect(read(entry({ action: 'create', recordType: 'grain', newValue: { name: 'Rye' } })).what).toBe(
      'Created a grain',
    );
    expect(
      read(entry({ action: 'create', recordType: 'grain-lot', newValue: { grain: 'Rye', supplierLotCode: 'L9' } }))
        .details,
    ).toEqual(['Grain: Rye', 'Supplier lot: L9']);
    expect(
      read(entry({ action: 'create', recordType: 'prep-batch', newValue: { code: 'PB-2', grainLotId: 5 } })).details,
    ).toEqual(['Code: PB-2']);
    const pub = read(
      entry({
        action: 'publish-version',
        recordType: 'procedure',
        field: 'version',
        oldValue: 1,
        newValue: { versionId: 8, version: 2, steps: 6 },
        reason: 'Longer flame',
      }),
    );
    expect(pub.details).toEqual(['Version: 2', 'Steps: 6']);
    expect(
      read(
        entry({
          action: 'upload',
          recordType: 'photo',
          newValue: { sha256: 'ab', mime: 'image/jpeg', bytes: 2_400_000 },
        }),
      ).details,
    ).toEqual(['Size: 2.3 MB']);
    expect(
      read(
        entry({
          action: 'import',
          recordType: 'import',
          newValue: { jars: 40, incidents: 3, rows: 43, ignoredColumns: [] },
        }),
      ).details,
    ).toEqual(['Jars: 40', 'Incidents: 3', 'Rows: 43']);
  });

  it('users, mail, training and cluster alerts', () => {
    expect(
      read(entry({ action: 'create', recordType: 'user', newValue: { username: 'ines', role: 'supervisor' } })).details,
    ).toEqual(['User name: ines', 'Role: supervisor']);
    expect(
      read(
        entry({
          action: 'change-password',
          recordType: 'user',
          field: 'password',
          newValue: { otherSessionsEnded: 2 },
        }),
      ),
    ).toMatchObject({ what: 'Changed their password', details: ['Other sign-ins ended: 2'] });
    expect(
      read(
        entry({
          action: 'mail-preference',
          recordType: 'user',
          field: 'mail:cluster-alert',
          oldValue: true,
          newValue: false,
        }),
      ).details,
    ).toEqual(['Mail “cluster alert”: yes → no']);
    expect(
      read(
        entry({
          action: 'create',
          recordType: 'training-record',
          newValue: { userId: 2, procedureVersionId: 8, version: 2, trainedOn: '2026-11-01' },
        }),
      ).details,
    ).toEqual(['Version: 2', 'Trained on: Nov 1, 2026']);
    expect(read(entry({ action: 'close', recordType: 'retraining-request' })).what).toBe('Closed a retraining request');
    expect(
      read(entry({ action: 'seen', recordType: 'cluster-alert', field: 'seenAt', oldValue: null, newValue: 'seen' }))
        .what,
    ).toBe('Looked at a cluster alert');
    expect(
      read(
        entry({
          action: 'update',
          recordType: 'lab-settings',
          field: 'timeZone',
          oldValue: 'UTC',
          newValue: 'Europe/Amsterdam',
        }),
      ).what,
    ).toBe('Changed the lab settings');
  });
});
