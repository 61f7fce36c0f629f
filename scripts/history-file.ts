import { historyColumns } from '../shared/schemas/imports';

/** Every 25th jar contaminated; runs, sessions and cultures shared by many rows, as a lab's history has them. */
export function historyFile(tag: string, rows: number): Buffer {
  const lines = [historyColumns.join(',')];
  for (let i = 0; i < rows; i += 1) {
    const day = String(1 + (i % 28)).padStart(2, '0');
    const bad = i % 25 === 0;
    lines.push(
      [
        `${tag}-${i}`,
        'rye',
        `${tag}-CR${i % 200}`,
        '90',
        `2026-02-${day}`,
        `${tag}-S${i % 28}-${Math.floor(i / 2000)}`,
        'Orla Vance',
        `${tag}-LC${i % 7}`,
        bad ? 'contaminated' : 'clean',
        bad ? 'yeast' : '',
        bad ? '2026-03-03' : '',
      ].join(','),
    );
  }
  return Buffer.from(lines.join('\n'));
}
