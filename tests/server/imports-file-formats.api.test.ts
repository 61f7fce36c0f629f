import { describe, expect, it } from 'vitest';
import { historyColumns } from '../../shared/schemas/imports';
import { dataSource } from '../../server/db/data-source';
import { Grain } from '../../server/grain/grain.entity';
import { Incident } from '../../server/incidents/incident.entity';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { createTestApp } from '../setup/test-app';
import { uniqueName } from '../setup/factories';
import { counts, csv, errorsOf, importingSupervisor, rejectionOf, resultOf, row } from './imports.fixtures';
import { issuePath } from '../setup/bodies';

const app = createTestApp();
const supervisor = () => importingSupervisor(app);

describe('POST /api/imports/history — reading real exports', () => {
  it('imports a spreadsheet export: BOM, CRLF, quoted comma, other column order, unknown columns', async () => {
    const sup = await supervisor();
    const tag = uniqueName('K');
    // RFC 4180 (Shafranovich, 2005) §2 rules 6–7: a field holding a comma or quote is quoted, inner quotes doubled.
    const lines = [
      ' Outcome ,JAR_LABEL,Grain,Shelf Note,cook_run,Cook_Minutes,inoculated_on,session,operator,culture,contaminant,found_on,',
      `clean,${tag}-1,Brown Rice,"top, left",${tag}-CR,120,2026-03-02,${tag}-S,"Vance, Orla",${tag}-LC,,,`,
      `contaminated,${tag}-2,brown rice,"said ""wet""",${tag}-CR,120,2026-03-02,${tag}-S,"Vance, Orla",${tag}-LC,green mould,2026-03-09,`,
      '',
      `Contaminated,${tag}-3,SORGHUM,,${tag}-CR,120,2026-03-02,${tag}-S,"Vance, Orla",${tag}-LC,Penicillium,2026-03-12,`,
    ];
    const file = Buffer.from('\uFEFF' + lines.join('\r\n') + '\r\n', 'utf8');
    const res = await sup.post(file, 'text/csv; charset=utf-8');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ imported: { jars: 3, incidents: 2 }, ignoredColumns: ['Shelf Note'] });

    const jars = await dataSource.manager.find(Jar, {
      where: [{ label: `${tag}-1` }, { label: `${tag}-2` }, { label: `${tag}-3` }],
      order: { label: 'ASC' },
    });
    const brownRice = await dataSource.manager.findOneByOrFail(Grain, { name: 'brown rice' });
    const sorghum = await dataSource.manager.findOneByOrFail(Grain, { name: 'sorghum' });
    expect(jars.map((j) => [j.label, j.grainId, j.status])).toEqual([
      [`${tag}-1`, brownRice.id, 'colonised'],
      [`${tag}-2`, brownRice.id, 'contaminated'],
      [`${tag}-3`, sorghum.id, 'contaminated'],
    ]);
    const session = await dataSource.manager.findOneByOrFail(InoculationSession, { code: `${tag}-S` });
    expect(session).toMatchObject({ heldOn: '2026-03-02', operatorId: null, operatorName: 'Vance, Orla' });
    const incidents = await dataSource.manager
      .createQueryBuilder(Incident, 'i')
      .innerJoin(IncidentJar, 'ij', 'ij.incidentId = i.id')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .where('j.label IN (:...labels)', { labels: [`${tag}-2`, `${tag}-3`] })
      .orderBy('j.label')
      .getMany();
    expect(incidents.map((i) => [i.contaminant, i.foundOn, i.foundByName])).toEqual([
      ['trichoderma', '2026-03-09', 'Vance, Orla'],
      ['penicillium', '2026-03-12', 'Vance, Orla'],
    ]);
  });

  it('keeps line numbers right after a quoted value that spans lines', async () => {
    const sup = await supervisor();
    const tag = uniqueName('L');
    const file = [
      `${historyColumns.join(',')},note`,
      `${tag}-1,rye,${tag}-CR,90,2026-03-02,${tag}-S,Orla Vance,${tag}-LC,clean,,,"first line`,
      'second line',
      'third line"',
      '',
      `${tag}-2,rye,${tag}-CR,90,2026-03-02,${tag}-S,Orla Vance,${tag}-LC,clean,,,`,
      `${tag}-3,oats,${tag}-CR,90,2026-13-02,${tag}-S,Orla Vance,${tag}-LC,clean,,,"a\r\nb"`,
      `${tag}-4,rye,${tag}-CR,90,2026-03-02,${tag}-S,Orla Vance,${tag}-LC,dirty,,,`,
    ].join('\n');
    const res = await sup.post(file);
    expect(res.status).toBe(422);
    expect(errorsOf(rejectionOf(res))).toEqual(['7:inoculated_on', '9:outcome']);
  });

  it('takes a multipart upload in the field file', async () => {
    const sup = await supervisor();
    const tag = uniqueName('M');
    const res = await sup.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', sup.token())
      .attach(
        'file',
        Buffer.from(
          csv([
            row(tag, 1),
            row(tag, 2, { outcome: 'contaminated', contaminant: 'pin mould', found_on: '2026-03-04' }),
          ]),
        ),
        {
          filename: 'history.csv',
          contentType: 'text/csv',
        },
      );
    expect(res.status).toBe(200);
    expect(resultOf(res).imported).toEqual({ jars: 2, incidents: 1 });
  });

  it('answers 413 to a body or a multipart file over 10 MB', async () => {
    const sup = await supervisor();
    const big = Buffer.alloc(10 * 1024 * 1024 + 1, 'a');
    const before = await counts();
    expect((await sup.post(big)).status).toBe(413);
    const multipart = await sup.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', sup.token())
      .attach('file', big, { filename: 'big.csv', contentType: 'text/csv' });
    expect(multipart.status).toBe(413);
    expect(issuePath(multipart)).toBe('file');
    expect(await counts()).toEqual(before);
  });

  it('names the line that is not UTF-8', async () => {
    const sup = await supervisor();
    const tag = uniqueName('N');
    const latin1 = Buffer.concat([
      Buffer.from(csv([row(tag, 1)])),
      Buffer.from(`${tag}-2,rye,${tag}-CR,90,2026-03-02,${tag}-S,Ren`),
      Buffer.from([0xe9]),
      Buffer.from(`e,${tag}-LC,clean,,\n`),
    ]);
    const res = await sup.post(latin1);
    expect(res.status).toBe(422);
    expect(rejectionOf(res).errors).toEqual([
      { line: 3, column: '', message: expect.stringContaining('UTF-8') as string },
    ]);
  });
});
