/** A label the lab numbers in sequence: letters, an optional dash, then digits (J00005, J-000120). */
export interface LabelFormat {
  prefix: string;
  width: number;
}

/** The demo lab's and a fresh lab's labels: J00001, J00002, … */
export const defaultLabelFormat: LabelFormat = { prefix: 'J', width: 5 };

/** Letters, an optional dash, digits: the same shape the repository's REGEXP selects. */
export const sequencedLabelSql = '^[A-Za-z]+-?[0-9]+$';
const sequencedLabel = /^([A-Za-z]+-?)([0-9]+)$/;

export function labelFormatOf(label: string): LabelFormat | null {
  const m = sequencedLabel.exec(label);
  return m ? { prefix: m[1]!, width: m[2]!.length } : null;
}

/**
 * The next `count` labels after the highest number stored under the prefix. BigInt, because an
 * imported J-99999999999999999999 is past 2^53, where Number(x) + 1 === Number(x).
 */
export function labelsAfter(format: LabelFormat, highestDigits: string | null, count: number): string[] {
  const start = BigInt(highestDigits ?? '0') + 1n;
  return Array.from(
    { length: count },
    (_, i) => `${format.prefix}${(start + BigInt(i)).toString().padStart(format.width, '0')}`,
  );
}
