import { pageOf } from '../../shared/schemas/common';
import { cookRunDetailSchema, cookRunSchema } from '../../shared/schemas/cook-runs';
import { bodyOf } from '../setup/bodies';
import { postCsvAs, sendAs, uniqueName, type Client } from '../setup/factories';

/** A valid new cook run: 90 min at 103.4 kPa, sea level, 1 L jars; overrides change any field. */
export const newRun = (over: Record<string, unknown> = {}) => ({
  code: uniqueName('CR'),
  vessel: 'Cooker A',
  cookedOn: '2026-03-02',
  minutesAtPressure: 90,
  gaugeKPa: 103.4,
  altitudeM: 0,
  container: '1 L jar',
  loadCount: 7,
  ...over,
});

// The 1-minute cycle of TRADE.md §3 [COMP]: F0 = 12.239 by the rectangle rule, from L = 10^((T − 121.1)/10)
// (PDA Technical Report No. 1, rev. 2007; Pistolesi & Mascherpa, F0: a technical note, 1988, rev. 2014).
const cycleCelsius = [100, 105, 110, 115, 118, 120, ...Array<number>(10).fill(121), 118, 115, 110, 105, 100];
export const cycleCsv = (header: string, eol = '\n') =>
  [header, ...cycleCelsius.map((c, m) => `${m},${c}`)].join(eol) + eol;

export const create = (client: Client, body: Record<string, unknown>) => sendAs(client, 'post', '/api/cook-runs', body);
export const postLog = (client: Client, id: number, csv: string) =>
  postCsvAs(client, `/api/cook-runs/${id}/readings`, csv);

/** A cook run as the create, edit and log routes answer it. */
export const runOf = (res: { body: unknown }) => bodyOf(res, cookRunDetailSchema);
export const createdRun = async (client: Client, body: Record<string, unknown>) => runOf(await create(client, body));
export const runPageSchema = pageOf(cookRunSchema);
