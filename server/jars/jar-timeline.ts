import { contaminantNames, contaminants, type Contaminant } from '../../shared/enums';
import type { JarStoryDto, TimelineEntryDto } from '../../shared/schemas/jar-story';

const eventTitles: Record<string, string> = {
  check: 'Checked',
  shaken: 'Shaken',
  moved: 'Moved',
  released: 'Released',
  hold: 'Put on hold',
  discarded: 'Discarded',
  colonised: 'Fully colonised',
  resume: 'Taken off hold',
};

const contaminantName = (code: string) =>
  (contaminants as readonly string[]).includes(code) ? contaminantNames[code as Contaminant] : code;

/** Date-only entries sort at the start of their day, before anything timed that day. */
const sortKey = (at: string) => (at.length === 10 ? `${at}T00:00:00.000Z` : at);

/** The jar's whole story in time order, from grain prep to its last photo. */
export function buildTimeline(s: Omit<JarStoryDto, 'timeline' | 'pageUrl'>): TimelineEntryDto[] {
  const t: TimelineEntryDto[] = [];
  const { jar, prepBatch: batch, grainLot: lot, cookRun, session } = s;
  if (batch) {
    const steps = [
      batch.soakHours !== null ? `soaked ${batch.soakHours} h` : null,
      batch.simmerMinutes !== null ? `simmered ${batch.simmerMinutes} min` : null,
      batch.drainMinutes !== null ? `drained ${batch.drainMinutes} min` : null,
    ];
    t.push({
      at: batch.preparedOn,
      kind: 'grain-prep',
      title: `Grain prepared: batch ${batch.code} (${jar.grain}${lot ? `, lot ${lot.supplierLotCode}` : ''})`,
      detail: steps.filter(Boolean).join(', ') || null,
      ref: batch.id,
    });
  }
  if (cookRun) {
    const f0 =
      cookRun.f0 === null
        ? null
        : cookRun.f0Source === 'log' && cookRun.logPlacement === 'centre'
          ? `F0 ${cookRun.f0.toFixed(1)} min (probe at the jar centre)`
          : `F0 at most ${cookRun.f0.toFixed(1)} min (${cookRun.f0Source === 'log' ? 'chamber log' : 'estimate'}, an upper bound)`;
    t.push({
      at: cookRun.startedAt ?? cookRun.cookedOn ?? jar.inoculatedOn,
      kind: 'cook-run',
      title: `Cook run ${cookRun.code}: ${cookRun.minutesAtPressure} min at pressure${cookRun.container ? `, ${cookRun.container}` : ''}`,
      detail: f0,
      ref: cookRun.id,
    });
  }
  for (const a of s.ancestry) {
    if (a.kind === 'culture' && a.preparedOn) {
      t.push({
        at: a.preparedOn,
        kind: 'culture',
        title: `Culture ${a.code} prepared`,
        detail: [a.species, a.strain].filter(Boolean).join(' ') || null,
        ref: a.id,
      });
    } else if (a.kind === 'jar') {
      t.push({
        at: a.inoculatedOn,
        kind: 'culture',
        title: `Parent jar ${a.label} inoculated`,
        detail: null,
        ref: a.id,
      });
    }
  }
  if (session) {
    t.push({
      at: session.startedAt ?? session.heldOn,
      kind: 'session',
      title: `Session ${session.code}${session.operatorName ? ` by ${session.operatorName}` : ''}`,
      detail: session.workspace,
      ref: session.id,
    });
  }
  const source = jar.cultureCode
    ? `culture ${jar.cultureCode}`
    : jar.parentJarLabel
      ? `jar ${jar.parentJarLabel}`
      : null;
  t.push({
    at: jar.inoculatedAt,
    kind: 'inoculated',
    title: `Inoculated${source ? ` from ${source}` : ''}`,
    detail: jar.inoculumMl === null ? null : `${jar.inoculumMl} ml`,
    ref: jar.id,
  });
  for (const e of s.events) {
    const detail = [
      e.percentColonised !== null ? `${e.percentColonised} % colonised` : null,
      e.room ? `to ${e.room} / ${e.shelf ?? ''}` : null,
      e.releasedTo
        ? `to ${e.releasedTo === 'grow-room' ? 'the grow room' : 'a customer'}${e.releasedToWho ? ` (${e.releasedToWho})` : ''}`
        : null,
      e.note,
    ].filter(Boolean);
    const title = eventTitles[e.type] ?? `Status set to ${e.newStatus ?? e.type}`;
    t.push({
      at: e.at,
      kind: 'event',
      title: `${title} by ${e.byName}`,
      detail: detail.join(' · ') || null,
      ref: e.id,
    });
  }
  for (const i of s.incidents) {
    t.push({
      at: i.foundAt,
      kind: 'incident',
      title: `Incident: ${contaminantName(i.contaminant)}${i.voided ? ' (voided)' : ''}`,
      detail: `found by ${i.foundByName}; ${i.status}, verdict ${i.verdict}`,
      ref: i.id,
    });
  }
  for (const p of s.photos) {
    t.push({
      at: p.createdAt,
      kind: 'photo',
      title: p.source === 'check' ? 'Photo at a check' : 'Photo on an incident',
      detail: null,
      ref: p.id,
    });
  }
  // Array.prototype.sort is stable, so same-instant entries keep the order above (prep before cook before session).
  return t.sort((a, b) => sortKey(a.at).localeCompare(sortKey(b.at)));
}
