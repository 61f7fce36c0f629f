import QRCode from 'qrcode';
import type { JarLabelDto, LabelSheetQuery } from '../../shared/schemas/jars';
import { notFound } from '../core/errors';
import { jarPageUrl } from './jar-story.service';
import { jarsRepository } from './jars.repository';
import { toJarRow } from './jars.mapper';

/** Level M survives a smudged or slightly torn label; a one-module margin keeps it small on a roll. */
export async function jarQrSvg(jarId: number): Promise<string> {
  const jar = await jarsRepository.findById(jarId);
  if (!jar) throw notFound('Jar');
  return QRCode.toString(jarPageUrl(jar.label), { type: 'svg', errorCorrectionLevel: 'M', margin: 1 });
}

export async function labelSheet(q: LabelSheetQuery): Promise<JarLabelDto[]> {
  const raws = q.ids ? await jarsRepository.rowsByIds(q.ids) : await jarsRepository.rowsBySession(q.sessionId!);
  return raws.map(toJarRow).map((j) => ({
    id: j.id,
    label: j.label,
    grain: j.grain,
    inoculatedOn: j.inoculatedOn,
    sessionCode: j.sessionCode,
    inoculumCode: j.cultureCode ?? j.parentJarLabel,
    pageUrl: jarPageUrl(j.label),
    qrPath: `/api/jars/${j.id}/qr.svg`,
  }));
}
