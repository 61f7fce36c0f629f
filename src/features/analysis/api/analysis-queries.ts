import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { factorSchema, type Factor } from '../../../../shared/enums';
import type { ActionVerdictsDto, BeforeAfterDto } from '../../../../shared/schemas/analysis-actions';
import type { CausesDto } from '../../../../shared/schemas/analysis-causes';
import type { ColonisationDto } from '../../../../shared/schemas/analysis-colonisation';
import type { CrosstabPageDto, RatesPageDto } from '../../../../shared/schemas/analysis-rates';
import type { JarsBehindDto } from '../../../../shared/schemas/analysis-jars-behind';
import type { LethalityDto } from '../../../../shared/schemas/analysis-lethality';
import type { WeeklyDto } from '../../../../shared/schemas/analysis-weekly';
import { localDateSchema } from '../../../../shared/schemas/common';
import { api, apiUrl } from '../../../lib/api-client';

export interface Period {
  from: string | undefined;
  to: string | undefined;
}

/** from/to live in the URL; a value the server would refuse is dropped rather than sent. */
export function readPeriod(params: URLSearchParams): Period {
  const pick = (key: 'from' | 'to') => {
    const parsed = localDateSchema.safeParse(params.get(key));
    return parsed.success ? parsed.data : undefined;
  };
  const from = pick('from');
  const to = pick('to');
  return from && to && from > to ? { from, to: undefined } : { from, to };
}

export function readFactor(params: URLSearchParams, key: string, fallback: Factor): Factor {
  const parsed = factorSchema.safeParse(params.get(key));
  return parsed.success ? parsed.data : fallback;
}

/** Which page of row levels and of column levels a cross-table shows. */
export interface CrosstabWindow {
  page: number;
  pageSize: number;
  colPage: number;
  colPageSize: number;
}

export type JarsOnly = 'all' | 'settled' | 'contaminated' | 'incubating';

export type LethalityOnly = LethalityDto['only'];

/** The address of a table's CSV export: the same route and filters, answered as a file. */
export const csvUrl = (path: string, query: Record<string, string | number | undefined>) =>
  apiUrl(`/analysis/${path}`, { ...query, format: 'csv' });

const get = <T>(path: string, query: Record<string, string | number | undefined>, signal: AbortSignal) =>
  api.get<T>(`/analysis/${path}`, { query, signal });

export const analysisQueries = {
  all: ['analysis'] as const,
  weekly: (p: Period) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'weekly', p] as const,
      queryFn: ({ signal }) => get<WeeklyDto>('weekly', { ...p }, signal),
      placeholderData: keepPreviousData,
    }),
  rates: (by: Factor, p: Period, page: number, pageSize: number) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'rates', by, p, page, pageSize] as const,
      queryFn: ({ signal }) => get<RatesPageDto>('rates', { by, ...p, page, pageSize }, signal),
      placeholderData: keepPreviousData,
    }),
  crosstab: (rows: Factor, cols: Factor, p: Period, at: CrosstabWindow) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'crosstab', rows, cols, p, at] as const,
      queryFn: ({ signal }) => get<CrosstabPageDto>('crosstab', { rows, cols, ...p, ...at }, signal),
      placeholderData: keepPreviousData,
    }),
  causes: (p: Period, minJars: number, page: number, pageSize: number) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'causes', p, minJars, page, pageSize] as const,
      queryFn: ({ signal }) => get<CausesDto>('causes', { ...p, minJars, page, pageSize, order: 'standing' }, signal),
      placeholderData: keepPreviousData,
    }),
  actions: (page: number, pageSize: number) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'actions', page, pageSize] as const,
      queryFn: ({ signal }) => get<ActionVerdictsDto>('actions', { page, pageSize }, signal),
      placeholderData: keepPreviousData,
    }),
  /** `doneOn` previews an open action as if done that day (while it is being closed). */
  beforeAfter: (actionId: number, doneOn?: string) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'before-after', actionId, doneOn ?? null] as const,
      queryFn: ({ signal }) => get<BeforeAfterDto>('before-after', { actionId, doneOn }, signal),
      retry: false,
    }),
  colonisation: (p: Period) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'colonisation', p] as const,
      queryFn: ({ signal }) => get<ColonisationDto>('colonisation', { ...p }, signal),
      placeholderData: keepPreviousData,
    }),
  lethality: (p: Period, only: LethalityOnly, page: number, pageSize: number) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'lethality', p, only, page, pageSize] as const,
      queryFn: ({ signal }) => get<LethalityDto>('lethality', { ...p, only, page, pageSize }, signal),
      placeholderData: keepPreviousData,
    }),
  jars: (
    factor: Factor,
    level: string,
    only: JarsOnly,
    p: Period,
    page: number,
    and?: { factor: Factor; level: string },
  ) =>
    queryOptions({
      queryKey: [...analysisQueries.all, 'jars', factor, level, only, p, page, and ?? null] as const,
      queryFn: ({ signal }) =>
        get<JarsBehindDto>(
          'jars',
          { factor, level, only, ...p, page, pageSize: 100, factor2: and?.factor, level2: and?.level },
          signal,
        ),
      placeholderData: keepPreviousData,
    }),
};
