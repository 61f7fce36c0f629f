import type { AncestorDto, CultureSummaryDto, JarStoryDto } from '../../shared/schemas/jar-story';
import { config } from '../core/config';
import { notFound } from '../core/errors';
import type { CultureRecord } from '../cultures/cultures.service';
import type { Jar } from './jar.entity';
import { jarStoryRepository } from './jar-story.repository';
import { buildTimeline } from './jar-timeline';
import { jarsRepository } from './jars.repository';
import { dateOnly, dateOrNull } from '../core/raw-values';
import { isoOrNull, toJarEventDto, toJarRow } from './jars.mapper';

export const jarPageUrl = (label: string) => `${config().publicUrl}/j/${encodeURIComponent(label)}`;

const cultureSummary = (c: CultureRecord): CultureSummaryDto => ({
  id: c.id,
  code: c.code,
  species: c.species,
  strain: c.strain,
  state: c.state,
  generation: c.generation,
  preparedOn: dateOrNull(c.preparedOn),
});

/** Nearest first: parent jars up to the culture, then the cultures it came from. */
async function ancestry(jar: Jar): Promise<AncestorDto[]> {
  const jars = await jarStoryRepository.ancestorJars(jar.id);
  const top = jars.at(-1);
  const cultureId = top ? top.cultureId : jar.cultureId;
  const cultures = cultureId ? await jarStoryRepository.cultureChain(cultureId) : [];
  return [
    ...jars.map((a): AncestorDto => ({
      kind: 'jar',
      id: a.id,
      label: a.label,
      status: a.status,
      inoculatedOn: dateOnly(a.inoculatedOn),
    })),
    ...cultures.map((c): AncestorDto => ({ kind: 'culture', ...cultureSummary(c) })),
  ];
}

async function photosOf(
  eventPhotos: { photoId: number; eventId: number }[],
  incidentIds: number[],
): Promise<JarStoryDto['photos']> {
  const { photos, incidentPhotos } = await jarStoryRepository.photos(
    eventPhotos.map((p) => p.photoId),
    incidentIds,
  );
  return photos.map((p) => {
    const fromEvent = eventPhotos.find((e) => e.photoId === p.id);
    const fromIncident = incidentPhotos.find((i) => i.photoId === p.id);
    return {
      id: p.id,
      mime: p.mime,
      createdAt: p.createdAt.toISOString(),
      source: fromEvent ? ('check' as const) : ('incident' as const),
      sourceId: fromEvent ? fromEvent.eventId : (fromIncident?.incidentId ?? 0),
    };
  });
}

export async function jarStory(find: { id: number } | { label: string }): Promise<JarStoryDto> {
  const jar = 'id' in find ? await jarsRepository.findById(find.id) : await jarsRepository.findByLabel(find.label);
  if (!jar) throw notFound('Jar');
  const [[raw], events, incidents, chain, batch, cookRun, session] = await Promise.all([
    jarsRepository.rowsByIds([jar.id]),
    jarStoryRepository.events(jar.id),
    jarStoryRepository.incidents(jar.id),
    ancestry(jar),
    jar.prepBatchId ? jarsRepository.findPrepBatch(jar.prepBatchId) : null,
    jar.cookRunId ? jarsRepository.findCookRun(jar.cookRunId) : null,
    jar.sessionId ? jarsRepository.findSession(jar.sessionId) : null,
  ]);
  const lot = batch ? await jarsRepository.findGrainLot(batch.grainLotId) : null;
  const eventPhotos = events.flatMap((e) => (e.photoId ? [{ photoId: e.photoId, eventId: e.id }] : []));

  const story: Omit<JarStoryDto, 'timeline' | 'pageUrl'> = {
    jar: toJarRow(raw!),
    grainLot: lot ? { id: lot.id, supplierLotCode: lot.supplierLotCode, receivedOn: dateOnly(lot.receivedOn) } : null,
    prepBatch: batch
      ? {
          id: batch.id,
          code: batch.code,
          preparedOn: dateOnly(batch.preparedOn),
          soakHours: batch.soakHours,
          simmerMinutes: batch.simmerMinutes,
          drainMinutes: batch.drainMinutes,
          notes: batch.notes,
        }
      : null,
    cookRun: cookRun
      ? {
          id: cookRun.id,
          code: cookRun.code,
          cookedOn: dateOrNull(cookRun.cookedOn),
          startedAt: isoOrNull(cookRun.startedAt),
          vessel: cookRun.vessel,
          minutesAtPressure: cookRun.minutesAtPressure,
          gaugeKPa: cookRun.gaugeKPa,
          container: cookRun.container,
          f0: cookRun.f0,
          f0Source: cookRun.f0Source,
          logPlacement: cookRun.logPlacement,
        }
      : null,
    session: session
      ? {
          id: session.id,
          code: session.code,
          heldOn: dateOnly(session.heldOn),
          startedAt: isoOrNull(session.startedAt),
          operatorName: session.operatorName,
          workspace: session.workspace,
        }
      : null,
    ancestry: chain,
    events: events.map(toJarEventDto),
    incidents: incidents.map((i) => ({
      id: i.id,
      foundAt: i.foundAt.toISOString(),
      foundOn: dateOnly(i.foundOn),
      foundByName: i.foundByName,
      stage: i.stage,
      contaminant: i.contaminant,
      status: i.status,
      verdict: i.verdict,
      voided: i.voided,
    })),
    photos: await photosOf(
      eventPhotos,
      incidents.map((i) => i.id),
    ),
  };
  return { ...story, timeline: buildTimeline(story), pageUrl: jarPageUrl(jar.label) };
}
