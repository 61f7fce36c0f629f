import type { CultureState } from '../../../shared/enums';

export interface CultureChoice {
  id: number;
  code: string;
  species: string | null;
  state: CultureState;
}

/**
 * What the culture picker offers: retired cultures left out (no new jar comes from one), sorted by code,
 * each named by its code and species, a quarantined one marked in words as well.
 */
export function cultureOptions(cultures: readonly CultureChoice[]): { id: number; label: string }[] {
  return cultures
    .filter((c) => c.state !== 'retired')
    .sort((a, b) => a.code.localeCompare(b.code, undefined, { numeric: true }))
    .map((c) => ({
      id: c.id,
      label:
        [c.code, c.species ?? 'species not recorded'].join(' · ') + (c.state === 'quarantined' ? ' (quarantined)' : ''),
    }));
}

/** The words shown beside the picker when the chosen culture has not been released. */
export function cultureWarning(culture: CultureChoice | undefined): string | null {
  if (culture?.state !== 'quarantined') return null;
  return (
    `${culture.code} is quarantined: no clean agar test has released it yet. ` +
    'Jars made from it are recorded with a warning; test it on agar before trusting them.'
  );
}
