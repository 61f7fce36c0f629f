import { parse, type CsvError } from 'csv-parse/sync';
import type { ImportError } from '../../shared/schemas/imports';

export interface CsvRecord {
  /** 1-based physical line on which the record starts. */
  line: number;
  fields: string[];
}

export type CsvParse = { ok: true; header: string[]; records: CsvRecord[] } | { ok: false; errors: ImportError[] };

const LF = 0x0a;
const CR = 0x0d;

/** Offsets at which a physical line starts, so a byte offset maps to its line number. */
function lineStarts(buf: Buffer): number[] {
  const starts = [0];
  for (let i = 0; i < buf.length; i += 1) {
    const b = buf[i];
    if (b === LF || (b === CR && buf[i + 1] !== LF)) starts.push(i + 1);
  }
  return starts;
}

function lineAt(starts: number[], offset: number): number {
  let lo = 0;
  let hi = starts.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if ((starts[mid] ?? 0) <= offset) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** A record starts after the previous one's end and any blank lines the parser skipped. */
function skipBlank(buf: Buffer, offset: number): number {
  let i = offset;
  while (i < buf.length && (buf[i] === LF || buf[i] === CR)) i += 1;
  return i;
}

/** The first line that is not valid UTF-8, or null when the whole file is. */
function firstBadUtf8Line(buf: Buffer): number | null {
  const decoder = new TextDecoder('utf-8', { fatal: true });
  try {
    decoder.decode(buf);
    return null;
  } catch {
    let line = 1;
    let start = 0;
    for (let i = 0; i <= buf.length; i += 1) {
      if (i === buf.length || buf[i] === LF) {
        try {
          decoder.decode(buf.subarray(start, i));
        } catch {
          return line;
        }
        line += 1;
        start = i + 1;
      }
    }
    return 1;
  }
}

const quoteMessages: Record<string, string> = {
  CSV_QUOTE_NOT_CLOSED: 'a quoted value is never closed: look for a stray double quote',
  CSV_INVALID_CLOSING_QUOTE: 'a double quote inside a quoted value must be written twice ("")',
  INVALID_OPENING_QUOTE: 'a double quote may only open a value: quote the whole value and write inner quotes twice',
};

/**
 * RFC 4180 over the raw bytes. Line numbers come from byte offsets rather than the parser's
 * own line counter, which drifts after quoted line breaks and skipped blank lines.
 */
export function parseHistoryCsv(buf: Buffer): CsvParse {
  const badLine = firstBadUtf8Line(buf);
  if (badLine !== null) {
    return {
      ok: false,
      errors: [{ line: badLine, column: '', message: 'is not UTF-8 text: save the file as "CSV UTF-8"' }],
    };
  }
  const starts = lineStarts(buf);
  const ends: number[] = [];
  let rows: string[][];
  try {
    rows = parse(buf, {
      bom: true,
      relax_column_count: true,
      skip_empty_lines: true,
      on_record: (record: string[], context: { bytes: number }) => {
        ends.push(context.bytes);
        return record;
      },
    });
  } catch (err) {
    const e = err as CsvError;
    const line = lineAt(starts, skipBlank(buf, ends.at(-1) ?? 0));
    return {
      ok: false,
      errors: [{ line, column: '', message: quoteMessages[e.code] ?? `cannot be read as CSV: ${e.message}` }],
    };
  }
  if (rows.length === 0) {
    return {
      ok: false,
      errors: [{ line: 1, column: '', message: 'the file is empty: the first line must name the columns' }],
    };
  }
  const records = rows.map((fields, i) => ({
    line: lineAt(starts, skipBlank(buf, i === 0 ? 0 : (ends[i - 1] ?? 0))),
    fields,
  }));
  const [head, ...body] = records;
  return { ok: true, header: head?.fields ?? [], records: body };
}
