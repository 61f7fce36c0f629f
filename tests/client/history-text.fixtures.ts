import { expect } from 'vitest';
import type { HistoryEntryDto } from '../../shared/schemas/incident-detail';
import { describeHistoryEntry, type HistoryContext } from '../../src/features/incidents/history-text';

// Every audit event kind the server writes (grep `action:` under server/), stored as recordAudit stores it:
// strings as they are, everything else as JSON.
const store = (v: unknown) => (v === undefined || v === null ? null : typeof v === 'string' ? v : JSON.stringify(v));
let n = 0;
export const entry = (e: {
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
export function read(e: HistoryEntryDto) {
  const line = describeHistoryEntry(e, ctx);
  const all = [line.when, line.who, line.what, ...line.details, line.reason ?? ''].join('\n');
  expect(all).not.toMatch(isoInstant);
  expect(all).not.toMatch(isoDay);
  expect(all).not.toMatch(/[{}[\]"]/);
  expect(all).not.toMatch(/: —|: ?$|undefined|null|NaN/m);
  return { ...line, all };
}
