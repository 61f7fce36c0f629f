import type { Agent } from './test-app';
import type { CausesDto } from '../../shared/schemas/analysis-causes';

/** The most rows one page of an analysis answer holds (shared/schemas/analysis.ts). */
const LARGEST_PAGE = 200;

/**
 * Every row of likely causes, read a page at a time as a client must: a JSON answer is always one page.
 * The leads and summary come from the first page; they are the same on every page.
 */
export async function everyCause(agent: Agent, query: Record<string, string | number> = {}): Promise<CausesDto> {
  const read = async (page: number) => {
    const res = await agent.get('/api/analysis/causes').query({ ...query, page, pageSize: LARGEST_PAGE });
    if (res.status !== 200) throw new Error(`causes page ${page} answered ${res.status}: ${JSON.stringify(res.body)}`);
    return res.body as CausesDto;
  };
  const first = await read(1);
  const causes = [...first.causes];
  for (let page = 2; causes.length < first.total; page++) {
    const more = (await read(page)).causes;
    if (more.length === 0) throw new Error(`causes: total ${first.total} but page ${page} is empty`);
    causes.push(...more);
  }
  return { ...first, causes, page: null, pageSize: null };
}
