import { describe, expect, it } from 'vitest';
import { countOf, countText } from '../../src/lib/count-text';

describe('counts as the reader sees them', () => {
  it('names one thing in the singular and any other number in the plural', () => {
    expect(countOf(1, 'contaminated jar')).toBe('1 contaminated jar');
    expect(countOf(0, 'contaminated jar')).toBe('0 contaminated jars');
    expect(countOf(244, 'jar')).toBe('244 jars');
    expect(countOf(2, 'batch', 'batches')).toBe('2 batches');
  });

  it('reads a total cut at the cap as more than it', () => {
    expect(countText(10_000, true)).toBe('more than 10,000');
    expect(countText(37)).toBe('37');
  });
});
