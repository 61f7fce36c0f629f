import type { Factor } from '../enums';

export interface JarBehind {
  id: number;
  label: string;
  inoculatedOn: string;
  status: string;
  contaminated: boolean;
  incubating: boolean;
  contaminant: string | null;
  foundOn: string | null;
  /** The jar's first incident that counts, for a link. */
  incidentId: number | null;
}

export interface JarsBehindDto {
  factor: Factor;
  level: string;
  factor2: Factor | null;
  level2: string | null;
  items: JarBehind[];
  total: number;
  page: number;
  pageSize: number;
}
