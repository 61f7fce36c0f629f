import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { historyColumns, type ImportError } from '../../shared/schemas/imports';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { dataSource } from '../../server/db/data-source';
import { Grain } from '../../server/grain/grain.entity';
import { Incident } from '../../server/incidents/incident.entity';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { localDate } from '../../server/core/local-time';
import { createTestApp, csrfAgent } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';

const app = createTestApp();
type Row = Record<(typeof historyColumns)[number], string>;

/** One clean rye jar; each test names its own labels and codes so files never clash. */
function row(tag: string, n: number, over: Partial<Row> = {}): Row {
  return {
    jar_label: `${tag}-J${n}`,
    grain: 'rye',
    cook_run: `${tag}-CR`,
    cook_minutes: '90',
    inoculated_on: '2026-03-02',
    session: `${tag}-S`,
    operator: 'Orla Vance',
    culture: `${tag}-LC`,
    outcome: 'clean',
    contaminant: '',
    found_on: '',
    ...over,
  };
}

const csv = (rows: Row[], eol = '\n') =>
  [historyColumns.join(','), ...rows.map((r) => historyColumns.map((c) => r[c]).join(','))].join(eol) + eol;

const tables = ['jars', 'incidents', 'incident_jars', 'cook_runs', 'inoculation_sessions', 'cultures', 'audit_events'];
async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const t of tables) {
    const [r] = await dataSource.query<{ n: string }[]>(`SELECT COUNT(*) AS n FROM \`${t}\``);
    out[t] = Number(r?.n);
  }
  return out;
}

async function supervisor() {
  const client = await signedIn(app, 'supervisor');
  const post = (body: string | Buffer, type = 'text/csv') =>
    client.agent.post('/api/imports/history').set('X-CSRF-Token', client.token()).set('Content-Type', type).send(body);
  return { ...client, post };
}

const errorsOf = (body: { errors: ImportError[] }) => body.errors.map((e) => `${e.line}:${e.column}`);

describe('POST /api/imports/history — access', () => {
  it('answers 401 with a CSRF token but no session', async () => {
    const client = await csrfAgent(app);
    const res = await client.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', client.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('A'), 1)]));
    expect(res.status).toBe(401);
  });

  it('answers 403 without a CSRF token, before looking at the session', async () => {
    const res = await supertest(app).post('/api/imports/history').set('Content-Type', 'text/csv').send('jar_label\n');
    expect(res.status).toBe(403);
  });

  it.each(['technician', 'trainer'] as const)('answers 403 to a %s and writes nothing', async (role) => {
    const client = await signedIn(app, role);
    const before = await counts();
    const res = await client.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', client.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('B'), 1)]));
    expect(res.status).toBe(403);
    expect(await counts()).toEqual(before);
  });

  it('lets an admin import', async () => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', admin.token())
      .set('Content-Type', 'text/csv')
      .send(csv([row(uniqueName('C'), 1)]));
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ imported: { jars: 1, incidents: 0 }, ignoredColumns: [] });
  });

  it('answers 400 naming file when there is no body', async () => {
    const sup = await supervisor();
    const res = await sup.agent.post('/api/imports/history').set('X-CSRF-Token', sup.token()).send({ rows: [] });
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('file');
  });
});

describe('POST /api/imports/history — a whole file or nothing', () => {
  it('answers 422 with every bad row by line and column, and writes nothing', async () => {
    const sup = await supervisor();
    const tag = uniqueName('D');
    const file = csv([
      row(tag, 1),
      row(tag, 2, { inoculated_on: '2026-02-30' }),
      row(tag, 3, { grain: 'quinoa', cook_run: `${tag}-CR2`, cook_minutes: '120' }),
      row(tag, 4, { cook_minutes: '90.5', outcome: 'maybe' }),
      row(tag, 5, { outcome: 'contaminated' }),
      row(tag, 6, { outcome: 'contaminated', contaminant: 'lichen', found_on: '2026-03-01' }),
      row(tag, 7, { outcome: 'clean', contaminant: 'yeast' }),
    ]);
    const before = await counts();
    const res = await sup.post(file);
    expect(res.status).toBe(422);
    expect(errorsOf(res.body)).toEqual([
      '3:inoculated_on',
      '4:grain',
      '5:cook_minutes',
      '5:outcome',
      '6:contaminant',
      '6:found_on',
      '7:contaminant',
      '7:found_on',
      '8:contaminant',
    ]);
    expect(res.body.errors[0].message).toContain('2026-02-30');
    expect(res.body.errors[1].message).toContain('quinoa');
    expect(res.body.errors[6].message).toContain('lichen');
    expect(res.body.errors[7].message).toContain('before inoculated_on');
    expect(await counts()).toEqual(before);
  });

  it('refuses a label repeated in the file and one already stored', async () => {
    const sup = await supervisor();
    const tag = uniqueName('E');
    await sup.post(csv([row(tag, 1)])).expect(200);
    const before = await counts();
    const res = await sup.post(csv([row(tag, 2), row(tag, 3), row(tag, 2), row(tag, 1, { jar_label: `${tag}-j1` })]));
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { line: 4, column: 'jar_label', message: `"${tag}-J2" repeats the label on line 2` },
      { line: 5, column: 'jar_label', message: `"${tag}-j1" is already stored: jar labels are unique` },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('refuses a cook run code with other minutes, in the file or as stored', async () => {
    const sup = await supervisor();
    const tag = uniqueName('F');
    await sup.post(csv([row(tag, 1, { cook_run: `${tag}-OLD`, cook_minutes: '120' })])).expect(200);
    const res = await sup.post(
      csv([
        row(tag, 2),
        row(tag, 3, { cook_minutes: '45' }),
        row(tag, 4, { cook_run: `${tag}-OLD`, cook_minutes: '90' }),
      ]),
    );
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { line: 3, column: 'cook_minutes', message: `cook run ${tag}-CR has 90 minutes at pressure on line 2, not 45` },
      {
        line: 4,
        column: 'cook_minutes',
        message: `cook run ${tag}-OLD is stored with 120 minutes at pressure, not 90`,
      },
    ]);
  });

  it('refuses a session code with another date or operator, in the file or as stored', async () => {
    const sup = await supervisor();
    const tag = uniqueName('G');
    await sup.post(csv([row(tag, 1, { session: `${tag}-OLD` })])).expect(200);
    const before = await counts();
    const res = await sup.post(
      csv([
        row(tag, 2),
        row(tag, 3, { inoculated_on: '2026-03-03' }),
        row(tag, 4, { operator: 'Bram Tolley' }),
        row(tag, 5, { session: `${tag}-OLD`, inoculated_on: '2026-03-09' }),
        row(tag, 6, { session: `${tag}-OLD`, operator: 'orla vance' }),
        row(tag, 7, { session: `${tag}-OLD`, operator: 'Bram Tolley' }),
      ]),
    );
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { line: 3, column: 'inoculated_on', message: `session ${tag}-S is held on 2026-03-02 on line 2, not 2026-03-03` },
      { line: 4, column: 'operator', message: `session ${tag}-S has operator Orla Vance on line 2, not Bram Tolley` },
      {
        line: 5,
        column: 'inoculated_on',
        message: `session ${tag}-OLD is stored as held on 2026-03-02, not 2026-03-09`,
      },
      {
        line: 7,
        column: 'operator',
        message: `session ${tag}-OLD is stored with operator Orla Vance, not Bram Tolley`,
      },
    ]);
    expect(await counts()).toEqual(before);
  });

  it('answers 422 at line 1 naming each required column that is missing', async () => {
    const sup = await supervisor();
    const res = await sup.post(
      'jar_label,grain,cook_run,inoculated_on,session,operator,outcome\nX-1,rye,CR,2026-03-02,S,Ann,clean\n',
    );
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { line: 1, column: 'cook_minutes', message: 'is missing from the header: it is a required column' },
      { line: 1, column: 'culture', message: 'is missing from the header: it is a required column' },
    ]);
  });

  it('names the line of a row with a missing comma and of a broken quote', async () => {
    const sup = await supervisor();
    const tag = uniqueName('H');
    const good = csv([row(tag, 1)]);
    const short = `${good}${tag}-J2,rye,${tag}-CR,90,2026-03-02,${tag}-S,Orla Vance,${tag}-LC,clean,\n`;
    const res = await sup.post(short);
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { line: 3, column: '', message: expect.stringContaining('has 10 values but the header has 11') },
    ]);
    const quote = `${good}${tag}-J3,rye,${tag}-CR,90,2026-03-02,${tag}-S,"Orla "V" Vance",${tag}-LC,clean,,\n`;
    const bad = await sup.post(quote);
    expect(bad.status).toBe(422);
    expect(bad.body.errors).toEqual([{ line: 3, column: '', message: expect.stringContaining('double quote') }]);
  });
});

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
    expect(errorsOf(res.body)).toEqual(['7:inoculated_on', '9:outcome']);
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
    expect(res.body.imported).toEqual({ jars: 2, incidents: 1 });
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
    expect(multipart.body.error.issues[0].path).toBe('file');
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
    expect(res.body.errors).toEqual([{ line: 3, column: '', message: expect.stringContaining('UTF-8') }]);
  });
});

describe('POST /api/imports/history — what is written', () => {
  it('writes exactly the jars, incidents, runs, sessions and cultures of the file, with one audit event for the import and one for each run, session and culture made', async () => {
    const sup = await supervisor();
    const tag = uniqueName('P');
    const today = localDate(new Date());
    const recent = new Date(Date.parse(`${today}T12:00:00Z`) - 5 * 86_400_000).toISOString().slice(0, 10);
    const contaminated = (n: number, contaminant: string, found: string, over: Partial<Row> = {}) =>
      row(tag, n, { outcome: 'contaminated', contaminant, found_on: found, ...over });
    const file = csv([
      row(tag, 1),
      contaminated(2, 'bacterial', '2026-03-05'),
      contaminated(3, 'Green Mould (Trichoderma)', '2026-03-12'),
      row(tag, 4, {
        cook_run: `${tag}-CR2`,
        cook_minutes: '45',
        session: `${tag}-S2`,
        inoculated_on: '2026-07-06',
        operator: sup.user.username,
      }),
      contaminated(5, 'pin-mould', '2026-07-08', {
        cook_run: `${tag}-CR2`,
        cook_minutes: '45',
        session: `${tag}-S2`,
        inoculated_on: '2026-07-06',
        operator: sup.user.username,
      }),
      row(tag, 6, { session: `${tag}-S3`, inoculated_on: recent, culture: `${tag}-LC2` }),
    ]);
    const before = await counts();
    const res = await sup.post(file);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ imported: { jars: 6, incidents: 3 }, ignoredColumns: [] });
    const after = await counts();
    expect(Object.fromEntries(tables.map((t) => [t, (after[t] ?? 0) - (before[t] ?? 0)]))).toEqual({
      jars: 6,
      incidents: 3,
      incident_jars: 3,
      cook_runs: 2,
      inoculation_sessions: 3,
      cultures: 2,
      // One for the import; each run, session and culture is audited by its own module as it is made.
      audit_events: 1 + 2 + 3 + 2,
    });

    const jars = await dataSource.manager.find(Jar, {
      where: { cookRunId: (await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR` })).id },
      order: { label: 'ASC' },
    });
    expect(jars.map((j) => [j.label, j.status, j.imported])).toEqual([
      [`${tag}-J1`, 'colonised', true],
      [`${tag}-J2`, 'contaminated', true],
      [`${tag}-J3`, 'contaminated', true],
      [`${tag}-J6`, 'incubating', true],
    ]);
    // Noon in Europe/London: GMT (UTC+0) in March, BST (UTC+1) in July —
    // Summer Time Order 2002 / EU Directive 2000/84/EC, last Sunday of March to last Sunday of October.
    expect(jars[0]!.inoculatedAt.toISOString()).toBe('2026-03-02T12:00:00.000Z');
    const july = await dataSource.manager.findOneByOrFail(Jar, { label: `${tag}-J4` });
    expect(july.inoculatedAt.toISOString()).toBe('2026-07-06T11:00:00.000Z');
    expect(july.inoculatedOn).toBe('2026-07-06');

    const run2 = await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR2` });
    expect(run2.minutesAtPressure).toBe(45);
    const s2 = await dataSource.manager.findOneByOrFail(InoculationSession, { code: `${tag}-S2` });
    expect(s2).toMatchObject({ heldOn: '2026-07-06', operatorId: sup.user.id, operatorName: sup.user.displayName });
    const culture = await dataSource.manager.findOneByOrFail(Culture, { code: `${tag}-LC2` });
    expect(culture.state).toBe('released');

    const incidents = await dataSource.manager
      .createQueryBuilder(Incident, 'i')
      .innerJoin(IncidentJar, 'ij', 'ij.incidentId = i.id')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .addSelect('j.label', 'label')
      .where('j.label LIKE :p', { p: `${tag}-%` })
      .orderBy('j.label')
      .getMany();
    expect(
      incidents.map((i) => [
        i.contaminant,
        i.foundOn,
        i.foundAt.toISOString(),
        i.status,
        i.verdict,
        i.imported,
        i.stage,
        i.voided,
      ]),
    ).toEqual([
      ['bacterial', '2026-03-05', '2026-03-05T12:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
      ['trichoderma', '2026-03-12', '2026-03-12T12:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
      ['pin-mould', '2026-07-08', '2026-07-08T11:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
    ]);
    expect(incidents.map((i) => [i.foundByName, i.foundById])).toEqual([
      ['Orla Vance', null],
      ['Orla Vance', null],
      [sup.user.displayName, sup.user.id],
    ]);

    const audit = await dataSource.manager.find(AuditEvent, { where: { action: 'import', userId: sup.user.id } });
    expect(audit).toHaveLength(1);
    expect(audit[0]!.recordType).toBe('import');
    expect(JSON.parse(audit[0]!.newValue ?? '{}')).toMatchObject({
      jars: 6,
      incidents: 3,
      cookRuns: 2,
      sessions: 3,
      cultures: 2,
    });
  });

  it('adds jars to cook runs, sessions and cultures already stored when their attributes agree', async () => {
    const sup = await supervisor();
    const tag = uniqueName('Q');
    await sup.post(csv([row(tag, 1)])).expect(200);
    const before = await counts();
    const res = await sup.post(
      csv([row(tag, 2, { cook_run: `${tag}-cr`, session: `${tag}-s`, operator: 'ORLA VANCE', culture: `${tag}-lc` })]),
    );
    expect(res.status).toBe(200);
    const after = await counts();
    expect([
      after.jars! - before.jars!,
      after.cook_runs! - before.cook_runs!,
      after.inoculation_sessions! - before.inoculation_sessions!,
      after.cultures! - before.cultures!,
    ]).toEqual([1, 0, 0, 0]);
  });

  it('imports 50,000 rows well inside a minute', { timeout: 120_000 }, async () => {
    const sup = await supervisor();
    const tag = uniqueName('Z');
    const lines = [historyColumns.join(',')];
    for (let i = 0; i < 50_000; i += 1) {
      const day = String(1 + (i % 28)).padStart(2, '0');
      const bad = i % 25 === 0;
      lines.push(
        [
          `${tag}-${i}`,
          'rye',
          `${tag}-CR${i % 200}`,
          '90',
          `2026-02-${day}`,
          `${tag}-S${i % 28}-${Math.floor(i / 2000)}`,
          'Orla Vance',
          `${tag}-LC${i % 7}`,
          bad ? 'contaminated' : 'clean',
          bad ? 'yeast' : '',
          bad ? '2026-03-03' : '',
        ].join(','),
      );
    }
    const started = Date.now();
    const res = await sup.post(lines.join('\n'));
    const seconds = (Date.now() - started) / 1000;
    expect(res.status).toBe(200);
    expect(res.body.imported).toEqual({ jars: 50_000, incidents: 2_000 });
    expect(seconds).toBeLessThan(60);
  });
});
