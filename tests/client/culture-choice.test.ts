import { describe, expect, it } from 'vitest';
import { cultureOptions, cultureWarning, type CultureChoice } from '../../src/features/jars/culture-choice';

const culture = (
  id: number,
  code: string,
  state: CultureChoice['state'],
  species: string | null = 'Pleurotus ostreatus',
) => ({ id, code, species, state }) satisfies CultureChoice;

describe('cultureOptions', () => {
  it('leaves retired cultures out and names each by code and species, quarantined ones in words', () => {
    const options = cultureOptions([
      culture(3, 'LC-0921', 'quarantined', 'Hericium erinaceus'),
      culture(1, 'LC-0917', 'released'),
      culture(2, 'LC-0919', 'retired'),
      culture(4, 'LC-0925', 'released', null),
    ]);
    expect(options).toEqual([
      { id: 1, label: 'LC-0917 · Pleurotus ostreatus' },
      { id: 3, label: 'LC-0921 · Hericium erinaceus (quarantined)' },
      { id: 4, label: 'LC-0925 · species not recorded' },
    ]);
  });

  it('sorts codes by their numbers, so LC-9 comes before LC-10', () => {
    const options = cultureOptions([culture(1, 'LC-10', 'released'), culture(2, 'LC-9', 'released')]);
    expect(options.map((o) => o.id)).toEqual([2, 1]);
  });
});

describe('cultureWarning', () => {
  it('warns in words for a quarantined culture and says nothing for a released one or none', () => {
    expect(cultureWarning(culture(3, 'LC-0921', 'quarantined'))).toMatch(/^LC-0921 is quarantined: /);
    expect(cultureWarning(culture(1, 'LC-0917', 'released'))).toBeNull();
    expect(cultureWarning(undefined)).toBeNull();
  });
});
