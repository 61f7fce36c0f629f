import type { AgarTestDto, CultureDto, CultureSummaryDto } from '../../shared/schemas/cultures';
import type { AgarTest } from './agar-test.entity';
import type { Culture } from './culture.entity';

export const toCultureDto = (c: Culture, parentCode: string | null): CultureDto => ({
  id: c.id,
  code: c.code,
  species: c.species,
  strain: c.strain,
  preparedOn: c.preparedOn,
  generation: c.generation,
  volumeMl: c.volumeMl,
  parentCultureId: c.parentCultureId,
  parentCode,
  state: c.state,
  notes: c.notes,
  createdAt: c.createdAt.toISOString(),
});

export const toCultureSummaryDto = (c: Culture): CultureSummaryDto => ({
  id: c.id,
  code: c.code,
  state: c.state,
  preparedOn: c.preparedOn,
});

export const toAgarTestDto = (t: AgarTest): AgarTestDto => ({
  id: t.id,
  cultureId: t.cultureId,
  testedOn: t.testedOn,
  result: t.result,
  notes: t.notes,
  photoId: t.photoId,
  recordedById: t.recordedById,
  createdAt: t.createdAt.toISOString(),
});

export const cultureCsv = {
  filename: 'cultures.csv',
  header: ['code', 'species', 'strain', 'prepared_on', 'generation', 'volume_ml', 'parent', 'state', 'notes'],
  row: (c: CultureDto): unknown[] => [
    c.code,
    c.species,
    c.strain,
    c.preparedOn,
    c.generation,
    c.volumeMl,
    c.parentCode,
    c.state,
    c.notes,
  ],
};
