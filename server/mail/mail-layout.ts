import type { MailContent } from './mailer';

export type MailBlock =
  | { kind: 'p'; text: string }
  | { kind: 'list'; items: string[] }
  | { kind: 'table'; head: string[]; rows: string[][] }
  | { kind: 'caution'; title: string; text: string }
  | { kind: 'link'; label: string; url: string };

export function escapeHtml(s: string): string {
  return s.replace(/[&<>"']/g, (ch) => `&#${ch.charCodeAt(0)};`);
}

function textTable(head: string[], rows: string[][]): string {
  const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: string[]) =>
    cells
      .map((c, i) => (i === 0 ? c.padEnd(widths[i] ?? 0) : c.padStart(widths[i] ?? 0)))
      .join('  ')
      .trimEnd();
  return [line(head), widths.map((w) => '-'.repeat(w)).join('  '), ...rows.map(line)].join('\n');
}

function htmlBlock(b: MailBlock): string {
  switch (b.kind) {
    case 'p':
      return `<p style="margin:0 0 12px">${escapeHtml(b.text)}</p>`;
    case 'list':
      return `<ul style="margin:0 0 12px;padding-left:20px">${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
    case 'table': {
      const cell = (tag: 'th' | 'td', c: string, i: number) =>
        `<${tag} style="border:1px solid #c9cfc7;padding:4px 8px;text-align:${i === 0 ? 'left' : 'right'}">${escapeHtml(c)}</${tag}>`;
      const head = `<tr>${b.head.map((c, i) => cell('th', c, i)).join('')}</tr>`;
      const rows = b.rows.map((r) => `<tr>${r.map((c, i) => cell('td', c, i)).join('')}</tr>`).join('');
      return `<table style="border-collapse:collapse;margin:0 0 12px;font-size:14px">${head}${rows}</table>`;
    }
    case 'caution':
      return `<p style="margin:0 0 8px;padding:8px;border-left:4px solid #b7791f;background:#fdf6e3"><strong>${escapeHtml(b.title)}:</strong> ${escapeHtml(b.text)}</p>`;
    case 'link':
      return `<p style="margin:0 0 12px"><a href="${escapeHtml(b.url)}">${escapeHtml(b.label)}</a></p>`;
  }
}

function textBlock(b: MailBlock): string {
  switch (b.kind) {
    case 'p':
      return b.text;
    case 'list':
      return b.items.map((i) => `- ${i}`).join('\n');
    case 'table':
      return textTable(b.head, b.rows);
    case 'caution':
      return `! ${b.title}: ${b.text}`;
    case 'link':
      return `${b.label}: ${b.url}`;
  }
}

const footer = 'You receive this because of your role in Asepta. Choose which mails you get under Account → Mail.';

/** The same blocks rendered twice: a plain-text part and an HTML part. */
export function renderMail(subject: string, blocks: MailBlock[]): MailContent {
  const text = [...blocks.map(textBlock), '--', footer].join('\n\n') + '\n';
  const html =
    '<!doctype html><html><body style="font-family:Arial,Helvetica,sans-serif;color:#1f2a1f;max-width:680px">' +
    `<h1 style="font-size:18px">${escapeHtml(subject)}</h1>` +
    blocks.map(htmlBlock).join('') +
    `<p style="margin-top:24px;font-size:12px;color:#5b6b5b">${escapeHtml(footer)}</p></body></html>`;
  return { subject, text, html };
}

export const percent = (rate: number | null) => (rate === null ? '–' : `${(rate * 100).toFixed(1)} %`);
