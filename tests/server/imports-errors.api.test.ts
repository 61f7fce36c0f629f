import { describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { uniqueName } from '../setup/factories';
import { counts, csv, errorsOf, importingSupervisor, rejectionOf, row } from './imports.fixtures';

const app = createTestApp();
const supervisor = () => importingSupervisor(app);

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
    expect(errorsOf(rejectionOf(res))).toEqual([
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
    expect(rejectionOf(res).errors[0]!.message).toContain('2026-02-30');
    expect(rejectionOf(res).errors[1]!.message).toContain('quinoa');
    expect(rejectionOf(res).errors[6]!.message).toContain('lichen');
    expect(rejectionOf(res).errors[7]!.message).toContain('before inoculated_on');
    expect(await counts()).toEqual(before);
  });

  it('refuses a label repeated in the file and one already stored', async () => {
    const sup = await supervisor();
    const tag = uniqueName('E');
    await sup.post(csv([row(tag, 1)])).expect(200);
    const before = await counts();
    const res = await sup.post(csv([row(tag, 2), row(tag, 3), row(tag, 2), row(tag, 1, { jar_label: `${tag}-j1` })]));
    expect(res.status).toBe(422);
    expect(rejectionOf(res).errors).toEqual([
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
    expect(rejectionOf(res).errors).toEqual([
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
    expect(rejectionOf(res).errors).toEqual([
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
    expect(rejectionOf(res).errors).toEqual([
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
    expect(rejectionOf(res).errors).toEqual([
      { line: 3, column: '', message: expect.stringContaining('has 10 values but the header has 11') as string },
    ]);
    const quote = `${good}${tag}-J3,rye,${tag}-CR,90,2026-03-02,${tag}-S,"Orla "V" Vance",${tag}-LC,clean,,\n`;
    const bad = await sup.post(quote);
    expect(bad.status).toBe(422);
    expect(rejectionOf(bad).errors).toEqual([
      { line: 3, column: '', message: expect.stringContaining('double quote') as string },
    ]);
  });
});
