/**
 * A record code as labs write them: anything, then the last run of digits, then anything
 * (CR-2614, IS2026-07, run-0099b). The digits are what counts up; the rest is kept as written.
 */
export interface CodeParts {
  prefix: string;
  digits: string;
  suffix: string;
}

const lastNumber = /^(.*?)(\d+)(\D*)$/;

export function codeParts(code: string): CodeParts | null {
  const m = lastNumber.exec(code);
  return m ? { prefix: m[1]!, digits: m[2]!, suffix: m[3]! } : null;
}

// The unique index compares codes case-insensitively, so the pattern does too.
const samePattern = (a: CodeParts, b: CodeParts) =>
  a.prefix.toLowerCase() === b.prefix.toLowerCase() && a.suffix.toLowerCase() === b.suffix.toLowerCase();

/**
 * The code after the lab's latest one: its prefix and suffix, one more than the highest number stored
 * under the same pattern, zero-padded to the latest code's width (a number that outgrows the width
 * widens). A code without digits gets "-2"; a lab with no codes yet gets the fallback. BigInt, because an
 * imported code may carry more digits than a double holds exactly.
 */
export function nextCode(latest: string | null, others: readonly string[], fallback: string): string {
  const code = latest?.trim();
  if (!code) return fallback;
  const parts = codeParts(code);
  if (!parts) return `${code}-2`;
  let highest = BigInt(parts.digits);
  for (const other of others) {
    const p = codeParts(other.trim());
    if (p && samePattern(p, parts) && BigInt(p.digits) > highest) highest = BigInt(p.digits);
  }
  return `${parts.prefix}${(highest + 1n).toString().padStart(parts.digits.length, '0')}${parts.suffix}`;
}
