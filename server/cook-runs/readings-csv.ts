import { CsvError, parse } from 'csv-parse/sync';
import { readingCelsiusHeaders, readingMinuteHeaders } from '../../shared/schemas/cook-runs';
import type { TemperatureSample } from '../../shared/stats/lethality';

export interface LineError {
  line: number;
  column: string;
  message: string;
}

export const maxReadings = 20_000;
/** Heat-up, hold and cool-down of one load fit in two days; a longer span is a typo (and 1e400 is Infinity). */
export const maxLogMinutes = 2880;

const newlines = (s: string) => s.match(/\r\n|\n|\r/g)?.length ?? 0;

function number(text: string | undefined): number | null {
  const t = (text ?? '').trim();
  if (!/^-?(\d+(\.\d*)?|\.\d+)$/.test(t)) return null;
  return Number(t);
}

/**
 * A temperature log: one row per sample, elapsed minutes and °C. Errors carry the 1-based physical
 * line each record starts on (the header is line 1), so a technician can find the row in the file.
 */
export function parseReadingsCsv(text: string): { samples: TemperatureSample[]; errors: LineError[] } {
  let records: { info: { lines: number }; record: string[] }[];
  try {
    // With `info: true` csv-parse yields { info, record } per row; its typings do not say so.
    records = parse(text, {
      bom: true,
      skip_empty_lines: true,
      relax_column_count: true,
      info: true,
      trim: true,
    }) as unknown as typeof records;
  } catch (err) {
    if (err instanceof CsvError) {
      const line = (err as CsvError & { lines?: number }).lines ?? 1;
      return { samples: [], errors: [{ line, column: '', message: err.message }] };
    }
    throw err;
  }
  const [header, ...rows] = records;
  if (!header) return { samples: [], errors: [{ line: 1, column: '', message: 'the file is empty' }] };

  const names = header.record.map((h) => h.trim().toLowerCase());
  const minuteAt = names.findIndex((n) => (readingMinuteHeaders as readonly string[]).includes(n));
  const celsiusAt = names.findIndex((n) => (readingCelsiusHeaders as readonly string[]).includes(n));
  const errors: LineError[] = [];
  if (minuteAt < 0) {
    errors.push({
      line: 1,
      column: 'minute',
      message: `no elapsed-minutes column (name it ${readingMinuteHeaders.join(', ')})`,
    });
  }
  if (celsiusAt < 0) {
    errors.push({
      line: 1,
      column: 'celsius',
      message: `no temperature column (name it ${readingCelsiusHeaders.join(', ')})`,
    });
  }
  if (errors.length) return { samples: [], errors };
  const minuteName = header.record[minuteAt]!.trim();
  const celsiusName = header.record[celsiusAt]!.trim();

  if (rows.length > maxReadings) {
    return {
      samples: [],
      errors: [{ line: 1, column: '', message: `holds ${rows.length} readings; at most ${maxReadings} are accepted` }],
    };
  }
  if (rows.length < 2) {
    return { samples: [], errors: [{ line: 1, column: '', message: 'needs at least two readings to span any time' }] };
  }

  const samples: TemperatureSample[] = [];
  let previous: number | null = null;
  for (const { info, record } of rows) {
    const line = info.lines - record.reduce((n, field) => n + newlines(field), 0);
    const minute = number(record[minuteAt]);
    const celsius = number(record[celsiusAt]);
    if (minute === null)
      errors.push({
        line,
        column: minuteName,
        message: `must be a number of minutes (got "${record[minuteAt] ?? ''}")`,
      });
    else if (minute < 0) errors.push({ line, column: minuteName, message: 'must not be negative' });
    else if (minute > maxLogMinutes) {
      errors.push({
        line,
        column: minuteName,
        message: `must be at most ${maxLogMinutes} minutes (48 h) after the start`,
      });
    } else if (previous !== null && minute <= previous) {
      errors.push({ line, column: minuteName, message: `must be later than the row before (${previous})` });
    }
    if (celsius === null)
      errors.push({
        line,
        column: celsiusName,
        message: `must be a temperature in °C (got "${record[celsiusAt] ?? ''}")`,
      });
    else if (celsius < -50 || celsius > 200)
      errors.push({ line, column: celsiusName, message: 'must be between -50 and 200 °C' });
    if (minute !== null && minute >= 0 && minute <= maxLogMinutes) previous = Math.max(previous ?? minute, minute);
    if (minute !== null && celsius !== null && Number.isFinite(minute) && Number.isFinite(celsius))
      samples.push({ minute, celsius });
  }
  return { samples: errors.length ? [] : samples, errors };
}
