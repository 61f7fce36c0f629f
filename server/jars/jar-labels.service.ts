import QRCode from 'qrcode';
import type { EntityManager } from 'typeorm';
import type { LabelSheetRowDto, LabelSheetQuery } from '../../shared/schemas/jar-labels';
import { conflict, notFound } from '../core/errors';
import { jarPageUrl } from './jar-story.service';
import { jarLabelsRepository } from './jar-labels.repository';
import { jarsRepository } from './jars.repository';
import { toJarRow } from './jars.mapper';
import { defaultLabelFormat, labelFormatOf, labelsAfter } from './label-sequence';

const labelMaxLength = 40;

/**
 * One format for every jar: new labels take the prefix and width of the lab's latest numbered
 * label (imported or demo labels included) and continue the highest number under that prefix.
 * Call inside the transaction that holds the sequence lock.
 */
export async function nextJarLabels(m: EntityManager, count: number): Promise<string[]> {
  const latest = await jarLabelsRepository.latestSequencedLabel(m);
  const format = (latest ? labelFormatOf(latest) : null) ?? defaultLabelFormat;
  const labels = labelsAfter(format, await jarLabelsRepository.highestLabelDigits(m, format.prefix), count);
  if (labels.some((l) => l.length > labelMaxLength)) {
    throw conflict(`The label sequence ${format.prefix}… has run past ${labelMaxLength} characters.`);
  }
  return labels;
}

/** Level M survives a smudged or slightly torn label; a one-module margin keeps it small on a roll. */
export async function jarQrSvg(jarId: number): Promise<string> {
  const jar = await jarsRepository.findById(jarId);
  if (!jar) throw notFound('Jar');
  return QRCode.toString(jarPageUrl(jar.label), { type: 'svg', errorCorrectionLevel: 'M', margin: 1 });
}

export async function labelSheet(q: LabelSheetQuery): Promise<LabelSheetRowDto[]> {
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
