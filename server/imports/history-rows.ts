import { contaminantNames, contaminants, type Contaminant } from '../../shared/enums';
import {
  historyColumns,
  historyOutcomes,
  optionalHistoryColumns,
  type HistoryColumn,
  type ImportError,
} from '../../shared/schemas/imports';
import { isDateTooFarAhead } from '../../shared/schemas/common';
import type { CsvRecord } from './history-csv';

/** Values that failed their own check are '' (NaN for minutes), so later checks skip them. */
export interface HistoryRow {
  line: number;
  /** Every value passed its own check: only complete rows are written. */
  complete: boolean;
  label: string;
  grain: string;
  cookRun: string;
  cookMinutes: number;
  inoculatedOn: string;
  session: string;
  operator: string;
  culture: string;
  outcome: (typeof historyOutcomes)[number] | null;
  contaminant: Contaminant | null;
  foundOn: string | null;
}

export interface HeaderMap {
  index: Map<HistoryColumn, number>;
  ignoredColumns: string[];
  width: number;
}

/** Matching key for labels, codes and names: the database collation ignores case and accents. */
export const matchKey = (s: string) =>
  s.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase().replace(/\s+/g, ' ').trim();

export function mapHeader(header: string[], errors: ImportError[]): HeaderMap {
  const index = new Map<HistoryColumn, number>();
  const ignoredColumns: string[] = [];
  header.forEach((raw, i) => {
    const name = raw.trim();
    const known = historyColumns.find((c) => c === name.toLowerCase());
    if (!known) {
      if (name) ignoredColumns.push(name);
      return;
    }
    if (index.has(known)) errors.push({ line: 1, column: known, message: 'appears twice in the header' });
    else index.set(known, i);
  });
  for (const column of historyColumns) {
    if (!index.has(column) && !optionalHistoryColumns.includes(column)) {
      errors.push({ line: 1, column, message: 'is missing from the header: it is a required column' });
    }
  }
  return { index, ignoredColumns, width: header.length };
}

const contaminantByKey = new Map<string, Contaminant>();
for (const code of contaminants) {
  const name = contaminantNames[code];
  for (const alias of [code, code.replace(/-/g, ' '), name, name.replace(/\s*\(.*$/, '')]) {
    contaminantByKey.set(matchKey(alias), code);
  }
}
const contaminantHint = contaminants.map((c) => contaminantNames[c].replace(/\s*\(.*$/, '')).join(', ');

/** Only real calendar dates: 2026-02-30 is refused, not rolled into March. */
export function isCalendarDate(s: string): boolean {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(s);
  if (!m) return false;
  const [y, mo, d] = [Number(m[1]), Number(m[2]), Number(m[3])];
  const t = new Date(Date.UTC(y, mo - 1, d));
  return t.getUTCFullYear() === y && t.getUTCMonth() === mo - 1 && t.getUTCDate() === d && y >= 1900;
}

const maxLength: Partial<Record<HistoryColumn, number>> = {
  jar_label: 40,
  cook_run: 40,
  session: 40,
  culture: 40,
  operator: 120,
  grain: 60,
};

/** Checks one record's own values; rules across rows and against stored records come later. */
export function readRow(record: CsvRecord, header: HeaderMap, errors: ImportError[]): HistoryRow | null {
  const { line, fields } = record;
  if (fields.length !== header.width) {
    errors.push({
      line,
      column: '',
      message: `has ${fields.length} values but the header has ${header.width}: check for a missing or extra comma`,
    });
    return null;
  }
  const before = errors.length;
  const fail = (column: HistoryColumn, message: string) => errors.push({ line, column, message });
  const value = (column: HistoryColumn) => {
    const i = header.index.get(column);
    return i === undefined ? '' : (fields[i] ?? '').trim();
  };
  const required = (column: HistoryColumn) => {
    const v = value(column);
    if (!v) fail(column, 'is required');
    else if ((maxLength[column] ?? Infinity) < v.length) {
      fail(column, `is longer than ${maxLength[column]} characters`);
      return '';
    }
    return v;
  };
  const date = (column: HistoryColumn, v: string) => {
    if (v && !isCalendarDate(v)) {
      fail(column, `"${v}" is not a calendar date written YYYY-MM-DD`);
      return '';
    }
    if (v && isDateTooFarAhead(v)) {
      fail(column, `${v} is more than a day in the future`);
      return '';
    }
    return v;
  };

  const label = required('jar_label');
  const grain = required('grain');
  const cookRun = required('cook_run');
  const minutesText = required('cook_minutes');
  let cookMinutes = NaN;
  if (minutesText) {
    cookMinutes = /^\d+$/.test(minutesText) ? Number(minutesText) : NaN;
    if (!Number.isInteger(cookMinutes) || cookMinutes < 1 || cookMinutes > 1440) {
      fail('cook_minutes', `"${minutesText}" is not a whole number of minutes between 1 and 1440`);
      cookMinutes = NaN;
    }
  }
  const inoculatedOn = date('inoculated_on', required('inoculated_on'));
  const session = required('session');
  const operator = required('operator');
  const culture = required('culture');

  const outcomeText = required('outcome').toLowerCase();
  const outcome = historyOutcomes.find((o) => o === outcomeText);
  if (outcomeText && !outcome) fail('outcome', `"${value('outcome')}" must be clean or contaminated`);

  const contaminantText = value('contaminant');
  const foundText = value('found_on');
  let contaminant: Contaminant | null = null;
  if (outcome === 'contaminated') {
    if (!contaminantText) fail('contaminant', 'is required when the outcome is contaminated');
    else {
      contaminant = contaminantByKey.get(matchKey(contaminantText)) ?? null;
      if (!contaminant) fail('contaminant', `"${contaminantText}" is not on the contaminant list (${contaminantHint})`);
    }
    if (!foundText) fail('found_on', 'is required when the outcome is contaminated');
    else if (date('found_on', foundText) && inoculatedOn && foundText < inoculatedOn) {
      fail('found_on', `${foundText} is before inoculated_on (${inoculatedOn})`);
    }
  } else if (outcome === 'clean') {
    if (contaminantText) fail('contaminant', 'must be empty when the outcome is clean');
    if (foundText) fail('found_on', 'must be empty when the outcome is clean');
  }

  return {
    line,
    complete: errors.length === before,
    label,
    grain,
    cookRun,
    cookMinutes,
    inoculatedOn,
    session,
    operator,
    culture,
    outcome: outcome ?? null,
    contaminant,
    foundOn:
      outcome === 'contaminated' && isCalendarDate(foundText) && !isDateTooFarAhead(foundText) ? foundText : null,
  };
}

export const isBlankRecord = (record: CsvRecord) => record.fields.every((f) => f.trim() === '');
