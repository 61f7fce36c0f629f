/** Figures and plain-text tables for the bench's output. */
export interface Table {
  header: string[];
  rows: string[][];
}

export const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  const m = Math.floor(s.length / 2);
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
};

/** Nearest-rank percentile. */
export const percentile = (xs: number[], p: number) =>
  [...xs].sort((a, b) => a - b)[Math.ceil((p / 100) * xs.length) - 1]!;

/** The first column left-aligned, the figures right-aligned. */
export function formatTable(t: Table): string[] {
  const widths = t.header.map((h, i) => Math.max(h.length, ...t.rows.map((r) => r[i]!.length)));
  const line = (cells: string[]) =>
    cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]!) : c.padStart(widths[i]!))).join('  ');
  return [line(t.header), widths.map((w) => '-'.repeat(w)).join('  '), ...t.rows.map(line)];
}
