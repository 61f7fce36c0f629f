import { describe, expect, it } from 'vitest';
import { codeParts, nextCode } from '../../../shared/codes/next-code';

// Counting on a zero-padded sequence number and keeping its width is common practice for record codes;
// the arithmetic is checked against BigInt, JavaScript's arbitrary-precision integer (ECMA-262 §6.1.6.2).
describe('nextCode', () => {
  it('counts on from the latest code, keeping prefix and width', () => {
    expect(nextCode('CR-2614', [], 'CR-0001')).toBe('CR-2615');
    expect(nextCode('IS-0099', [], 'IS-0001')).toBe('IS-0100');
    expect(nextCode('run7', [], 'CR-0001')).toBe('run8');
  });

  it('widens a number that outgrows its width', () => {
    expect(nextCode('CR-999', [], 'CR-0001')).toBe('CR-1000');
    expect(nextCode('S9', [], 'IS-0001')).toBe('S10');
  });

  it('counts the last run of digits and keeps what follows it', () => {
    expect(nextCode('IS-2026-014', [], 'IS-0001')).toBe('IS-2026-015');
    expect(nextCode('2026/11-07b', [], 'IS-0001')).toBe('2026/11-08b');
    expect(nextCode('CR-12.A', [], 'CR-0001')).toBe('CR-13.A');
  });

  it('steps past the highest number under the same pattern, not only the latest', () => {
    const stored = ['CR-2614', 'CR-2620', 'cr-2630', 'CR-2699x', 'AB-9000'];
    // cr- matches CR- the way the case-insensitive unique index does; another suffix or prefix does not count.
    expect(nextCode('CR-2614', stored, 'CR-0001')).toBe('CR-2631');
  });

  it('gives the fallback when the lab has no codes, and "-2" to a code without digits', () => {
    expect(nextCode(null, [], 'CR-0001')).toBe('CR-0001');
    expect(nextCode('  ', [], 'IS-0001')).toBe('IS-0001');
    expect(nextCode('spring-batch', [], 'CR-0001')).toBe('spring-batch-2');
  });

  it('stays exact past 2^53, where Number(x) + 1 === Number(x)', () => {
    const digits = '90071992547409930';
    expect(nextCode(`CR-${digits}`, [], 'CR-0001')).toBe(`CR-${(BigInt(digits) + 1n).toString()}`);
    expect(nextCode(`CR-${digits}`, [], 'CR-0001')).toBe('CR-90071992547409931');
  });
});

describe('codeParts', () => {
  it('splits on the last run of digits', () => {
    expect(codeParts('IS-2026-014')).toEqual({ prefix: 'IS-2026-', digits: '014', suffix: '' });
    expect(codeParts('0042')).toEqual({ prefix: '', digits: '0042', suffix: '' });
    expect(codeParts('no digits')).toBeNull();
  });
});
