import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { setLabTimeZone } from '../../src/lib/format';
import { entry, read } from './history-text.fixtures';

describe('describeHistoryEntry', () => {
  // Europe/Amsterdam is UTC+1 in November (IANA time zone database); Intl (ICU) applies it.
  beforeAll(() => setLabTimeZone('Europe/Amsterdam'));
  afterAll(() => setLabTimeZone(undefined));

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
