import { stringify } from 'csv-stringify/sync';
import type { Response } from 'express';

function text(value: unknown): string {
  if (value === null || value === undefined) return '';
  if (value instanceof Date) return value.toISOString();
  if (typeof value === 'string') return value;
  if (typeof value === 'number' || typeof value === 'boolean' || typeof value === 'bigint') return value.toString();
  return JSON.stringify(value) ?? '';
}

/** A leading =, +, - or @ is prefixed with ' so that spreadsheets do not run the cell as a formula. */
export function csvCell(value: unknown): string {
  const s = text(value);
  return /^[=+\-@]/.test(s) && !/^-?\d+(\.\d+)?$/.test(s) ? `'${s}` : s;
}

/**
 * RFC 4180 (CRLF records, quoting by csv-stringify) over our formula escaping. csv-stringify quotes a field
 * holding the whole record delimiter only, so a lone CR or LF is matched here.
 */
export function toCsv(header: string[], rows: unknown[][]): string {
  return stringify(
    [header, ...rows].map((r) => r.map(csvCell)),
    { record_delimiter: 'windows', quoted_match: /[\r\n]/ },
  );
}

export function sendCsv(res: Response, filename: string, header: string[], rows: unknown[][]): void {
  res.setHeader('Content-Type', 'text/csv; charset=utf-8');
  res.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
  res.send('\uFEFF' + toCsv(header, rows));
}
