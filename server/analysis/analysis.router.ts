import { Router, type Response } from 'express';
import {
  actionVerdictsQuerySchema,
  beforeAfterQuerySchema,
  causesQuerySchema,
  crosstabQuerySchema,
  jarsBehindQuerySchema,
  lethalityQuerySchema,
  periodQuerySchema,
  ratesQuerySchema,
  type ActionVerdictsQuery,
  type BeforeAfterQuery,
  type CausesQuery,
  type CrosstabQuery,
  type JarsBehindQuery,
  type LethalityQuery,
  type PeriodQuery,
  type RatesQuery,
} from '../../shared/schemas/analysis';
import { requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { validate } from '../core/validate';
import * as csv from './analysis.csv';
import * as analysis from './analysis.service';
import { colonisation } from './colonisation';
import { lethality } from './lethality';
import { weeklyTable } from './weekly';
import { crosstabPage } from './level-pages';

export const analysisRouter = Router();

// DESIGN.md §2: every role reads the analysis (technicians flag, supervisors review, trainers read everything).
analysisRouter.use(requireUser);

function answer<T>(res: Response, format: 'json' | 'csv', dto: T, toCsv: (d: T) => csv.CsvTable) {
  if (format === 'json') {
    // Sent without res.json's ETag: every answer is worked out afresh (causes runs to megabytes), and
    // hashing it each time costs more than a revalidation would save.
    res.type('json').end(JSON.stringify(dto));
    return;
  }
  const t = toCsv(dto);
  sendCsv(res, t.filename, t.header, t.rows);
}

const query = <T>(req: { query: unknown }) => req.query as T;

analysisRouter.get('/rates', validate({ query: ratesQuerySchema }), async (req, res) => {
  const q = query<RatesQuery>(req);
  answer(res, q.format, await analysis.rates(q.by, q), csv.ratesCsv);
});

analysisRouter.get('/crosstab', validate({ query: crosstabQuerySchema }), async (req, res) => {
  const q = query<CrosstabQuery>(req);
  answer(res, q.format, crosstabPage(await analysis.crosstab(q.rows, q.cols, q), q), csv.crosstabCsv);
});

analysisRouter.get('/causes', validate({ query: causesQuerySchema }), async (req, res) => {
  const q = query<CausesQuery>(req);
  answer(res, q.format, await analysis.causes(q, q.minJars, q), csv.causesCsv);
});

analysisRouter.get('/weekly', validate({ query: periodQuerySchema }), async (req, res) => {
  const q = query<PeriodQuery>(req);
  answer(res, q.format, await weeklyTable(q), csv.weeklyCsv);
});

analysisRouter.get('/colonisation', validate({ query: periodQuerySchema }), async (req, res) => {
  const q = query<PeriodQuery>(req);
  answer(res, q.format, await colonisation(q), csv.colonisationCsv);
});

analysisRouter.get('/lethality', validate({ query: lethalityQuerySchema }), async (req, res) => {
  const q = query<LethalityQuery>(req);
  answer(res, q.format, await lethality(q), csv.lethalityCsv);
});

analysisRouter.get('/before-after', validate({ query: beforeAfterQuerySchema }), async (req, res) => {
  const q = query<BeforeAfterQuery>(req);
  answer(res, q.format, await analysis.beforeAfter(q), csv.beforeAfterCsv);
});

analysisRouter.get('/actions', validate({ query: actionVerdictsQuerySchema }), async (req, res) => {
  res.json(await analysis.actionVerdicts(query<ActionVerdictsQuery>(req)));
});

analysisRouter.get('/jars', validate({ query: jarsBehindQuerySchema }), async (req, res) => {
  res.json(await analysis.jarsBehind(query<JarsBehindQuery>(req)));
});
