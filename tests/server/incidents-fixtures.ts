import { randomBytes } from 'node:crypto';
import { Jimp } from 'jimp';
import { z } from 'zod';
import type { JarStatus } from '../../shared/enums';
import { incidentDetailSchema } from '../../shared/schemas/incident-detail';
import { photoSchema } from '../../shared/schemas/photos';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { localDate } from '../../server/core/local-time';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { dataSource } from '../../server/db/data-source';
import { Grain } from '../../server/grain/grain.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { bodyOf } from '../setup/bodies';
import { uniqueName } from '../setup/factories';

const dayMs = 86_400_000;

/** Production rows made straight in the database: incident tests need jars, not the jars API. */
export async function makeProduction(operatorName = uniqueName('Operator')) {
  const m = dataSource.manager;
  const cookRun = await m.save(
    m.create(CookRun, { code: uniqueName('CR'), minutesAtPressure: 90, container: '1 L jar' }),
  );
  const culture = await m.save(
    m.create(Culture, { code: uniqueName('LC'), species: 'Pleurotus ostreatus', state: 'released' }),
  );
  const session = await m.save(
    m.create(InoculationSession, {
      code: uniqueName('S'),
      heldOn: localDate(new Date(Date.now() - 5 * dayMs)),
      operatorName,
    }),
  );
  return { cookRun, culture, session, operatorName };
}

export async function makeJar(
  prod: Awaited<ReturnType<typeof makeProduction>>,
  options: { status?: JarStatus; parentJarId?: number; daysAgo?: number } = {},
): Promise<Jar> {
  const m = dataSource.manager;
  const grain = await m.findOneByOrFail(Grain, { name: 'rye' });
  const inoculatedAt = new Date(Date.now() - (options.daysAgo ?? 5) * dayMs);
  return m.save(
    m.create(Jar, {
      label: uniqueName('J').toUpperCase(),
      grainId: grain.id,
      cookRunId: prod.cookRun.id,
      sessionId: prod.session.id,
      cultureId: options.parentJarId ? null : prod.culture.id,
      parentJarId: options.parentJarId ?? null,
      status: options.status ?? 'incubating',
      colonisedOn: options.status === 'colonised' ? localDate(new Date(Date.now() - dayMs)) : null,
      inoculatedAt,
      inoculatedOn: localDate(inoculatedAt),
    }),
  );
}

export const auditCount = (recordType: string, recordId: number | string) =>
  dataSource.manager.countBy(AuditEvent, { recordType, recordId: String(recordId) });

/** A real JPEG of a given size; a random top stripe makes every call's bytes different. */
export async function makeJpeg(width = 320, height = 240): Promise<Buffer> {
  const image = new Jimp({ width, height, color: 0x8899aaff });
  const stripe = randomBytes(Math.min(width * 16, image.bitmap.data.length / 4) * 4);
  stripe.copy(image.bitmap.data, 0);
  return image.getBuffer('image/jpeg');
}

export async function makePng(width = 64, height = 48): Promise<Buffer> {
  const image = new Jimp({ width, height, color: 0x22aa44ff });
  return image.getBuffer('image/png');
}

/**
 * Puts an Exif APP1 segment holding only the Orientation tag (0x0112) right after the JPEG's SOI.
 * Layout per the Exif standard (CIPA DC-008, Exif 2.3, §4.5.2 TIFF header and §4.6.4 tag 274;
 * from memory): "Exif\0\0", little-endian TIFF header, one IFD0 entry of type SHORT.
 */
export function withExifOrientation(jpeg: Buffer, orientation: number): Buffer {
  const tiff = Buffer.alloc(26);
  tiff.write('II', 0, 'ascii');
  tiff.writeUInt16LE(42, 2);
  tiff.writeUInt32LE(8, 4);
  tiff.writeUInt16LE(1, 8);
  tiff.writeUInt16LE(0x0112, 10);
  tiff.writeUInt16LE(3, 12);
  tiff.writeUInt32LE(1, 14);
  tiff.writeUInt16LE(orientation, 18);
  tiff.writeUInt32LE(0, 22);
  const payload = Buffer.concat([Buffer.from('Exif\0\0', 'binary'), tiff]);
  const header = Buffer.from([0xff, 0xe1, 0, 0]);
  header.writeUInt16BE(payload.length + 2, 2);
  return Buffer.concat([jpeg.subarray(0, 2), header, payload, jpeg.subarray(2)]);
}

/** An ISO base-media 'ftyp' box with the heic brand, as an iPhone's HEIC photo starts (ISO/IEC 23008-12). */
export function heicBytes(): Buffer {
  const ftyp = Buffer.alloc(24);
  ftyp.writeUInt32BE(24, 0);
  ftyp.write('ftypheic', 4, 'ascii');
  ftyp.writeUInt32BE(0, 12);
  ftyp.write('mif1heic', 16, 'ascii');
  return Buffer.concat([ftyp, Buffer.alloc(2048, 1)]);
}

/** An incident as its create, detail and edit routes answer it. */
export const incidentOf = (res: { body: unknown }) => bodyOf(res, incidentDetailSchema);

/** The photos an upload answers with, one per file sent. */
export const photosOf = (res: { body: unknown }) => bodyOf(res, z.array(photoSchema));
