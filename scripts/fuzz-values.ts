// Values that break parsers: prototype names, bad ids, dates, numbers, strings and the keys they are sent under.

export const prototypeNames = [
  'constructor',
  'toString',
  'valueOf',
  'hasOwnProperty',
  '__proto__',
  'prototype',
  '__defineGetter__',
];
export const badIds = [
  'abc',
  '-1',
  '0',
  '1.5',
  '1e999',
  '0x10',
  '%00',
  '%E0%A4%A',
  'constructor',
  '9'.repeat(400),
  '%20',
  'null',
];
export const badDates = [
  '2026-02-30',
  '2026-11-31T12:00:00Z',
  '2099-01-01',
  '0000-00-00',
  '2026-13-01',
  '1e10',
  'yesterday',
  '',
];
export const badNumbers = ['1e400', '-1e400', 'NaN', '-0', '9'.repeat(400), '0.0000001', '-5', '1e21', '0x1f', ' 12 '];
export const weirdStrings = [
  '',
  ' ',
  '\u0000',
  '\uFFFD\uD800',
  'a'.repeat(5000),
  '<script>',
  "'; DROP TABLE jars; --",
  '=1+1',
  '🍄',
];
export const queryKeys = [
  'sort',
  'page',
  'pageSize',
  'from',
  'to',
  'q',
  'by',
  'rows',
  'cols',
  'status',
  'ids',
  'sessionId',
  'minJars',
  'days',
  'format',
  'grain',
  'role',
];
export const bodyKeys = [
  'username',
  'password',
  'currentPassword',
  'newPassword',
  'code',
  'name',
  'grainId',
  'count',
  'sessionId',
  'cultureId',
  'inoculatedAt',
  'foundAt',
  'at',
  'minutesAtPressure',
  'cookedOn',
  'heldOn',
  'startedAt',
  'jarLabels',
  'photoIds',
  'type',
  'percentColonised',
  'version',
  'reason',
  'status',
  'verdict',
  'steps',
  'kinds',
  'role',
  'active',
  'edges',
];

/** A lone surrogate cannot be percent-encoded as UTF-8: send the bytes a careless client would. */
export function encode(s: string): string {
  try {
    return encodeURIComponent(s);
  } catch {
    return '%ED%A0%80';
  }
}

/** Mulberry32: small, seeded, good enough to vary the probes. */
export function prng(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
