import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import iconv from 'iconv-lite';
import { Breed } from '../../analytics-api/src/db/entities/breed.entity';
import { signIn, startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let owner: Awaited<ReturnType<typeof signIn>>;
let officer: Awaited<ReturnType<typeof signIn>>;
let r1: number;
let c1: number;

beforeAll(async () => {
  t = await startTestApp();
  owner = await signIn(t.app, 'owner@example.test');
  officer = await signIn(t.app, 'officer@example.test');
  r1 = Number((await t.db.query("SELECT id FROM rabbitry WHERE name = 'Fenwick Hollow'"))[0].id);
  c1 = Number((await t.db.query("SELECT id FROM club WHERE name = 'Brackenford Valley Rabbit Club'"))[0].id);
});
afterAll(async () => { await t.close(); });

type Who = typeof owner;
async function upload(who: Who, base: string, kind: string, content: string | Buffer, name = 'file.csv') {
  return who.agent.post(`${base}/imports`).set('x-csrf-token', who.csrfToken).field('kind', kind)
    .attach('file', Buffer.isBuffer(content) ? content : Buffer.from(content, 'utf8'), name);
}
async function settle(who: Who, base: string, id: number) {
  for (;;) {
    const { body } = await who.agent.get(`${base}/imports/${id}`).expect(200);
    if (!['checking', 'committing'].includes(body.status)) return body;
    await new Promise((r) => setTimeout(r, 50));
  }
}
async function check(who: Who, base: string, id: number, mapping: Record<string, string>, extra: object = {}) {
  await who.agent.post(`${base}/imports/${id}/check`).set('x-csrf-token', who.csrfToken).send({ mapping, ...extra }).expect(202);
  return settle(who, base, id);
}
async function commit(who: Who, base: string, id: number, body: object = {}) {
  const res = await who.agent.post(`${base}/imports/${id}/commit`).set('x-csrf-token', who.csrfToken).send(body);
  if (res.status !== 202) return res;
  return { status: 202, body: await settle(who, base, id) };
}

// Semicolons, a BOM, a quoted field with the delimiter and a newline inside, two bad rows.
const ANIMALS = '\uFEFFTattoo;Name;Sex;Breed;Born;Sire;Dam;Notes\n' +
  'FH1;Elder Buck;B;Mini Rex;2025-01-10;;;founder\n' +
  'FH2;Elder Doe;D;Mini Rex;2025-02-11;;;"calm; good mother\nsecond line"\n' +
  'FH3;Kit One;doe;Mini Rex;2026-03-01;FH1;FH2;\n' +
  'FH4;Bad Sex;X;Mini Rex;2026-03-01;FH1;FH2;\n' +
  'FH5;Future;buck;Mini Rex;2099-01-01;FH1;FH2;\n';

describe('import wizard API', () => {
  it('suggests a mapping, reports row problems, refuses to commit errors, then commits all-or-nothing', async () => {
    const base = `/api/rabbitries/${r1}`;
    const up = await upload(owner, base, 'animals', ANIMALS);
    expect(up.status).toBe(201);
    expect(up.body.delimiter).toBe(';');
    expect(up.body.headers[0]).toBe('Tattoo');
    expect(up.body.suggestedMapping).toMatchObject({ ear_id: 'Tattoo', sex: 'Sex', sire_ear_id: 'Sire', dam_ear_id: 'Dam', born: 'Born' });
    const checked = await check(owner, base, up.body.id, up.body.suggestedMapping);
    expect(checked.status).toBe('checked');
    expect(checked.summary).toMatchObject({ totalRows: 5, newRows: 3, errorRows: 2 });
    const rows = checked.summary.problems.filter((p: { severity: string }) => p.severity === 'error').map((p: { row: number; field: string }) => `${p.row}:${p.field}`);
    expect(rows).toEqual(['5:sex', '6:born']);
    const refused = await commit(owner, base, up.body.id);
    expect(refused.status).toBe(409);
    const done = await commit(owner, base, up.body.id, { skipRowsWithErrors: true });
    expect(done.body.status).toBe('done');
    expect(done.body.message).toBe('3 new, 0 already present');
    const kit = await t.db.query("SELECT a.sire_id, s.ear_id AS sire, d.ear_id AS dam FROM animal a JOIN animal s ON s.id = a.sire_id JOIN animal d ON d.id = a.dam_id WHERE a.ear_id = 'FH3'");
    expect(kit[0]).toMatchObject({ sire: 'FH1', dam: 'FH2' });
    const notes = await t.db.query("SELECT notes FROM animal WHERE ear_id = 'FH2'");
    expect(notes[0].notes).toBe('calm; good mother\nsecond line');
  });

  it('re-importing the same file adds nothing and says so', async () => {
    const base = `/api/rabbitries/${r1}`;
    const up = await upload(owner, base, 'animals', ANIMALS);
    const checked = await check(owner, base, up.body.id, up.body.suggestedMapping);
    expect(checked.summary).toMatchObject({ newRows: 0, alreadyPresent: 3 });
    const done = await commit(owner, base, up.body.id, { skipRowsWithErrors: true });
    expect(done.body.message).toBe('0 new, 3 already present');
    expect(Number((await t.db.query(`SELECT COUNT(*) AS n FROM animal WHERE rabbitry_id = ${r1}`))[0].n)).toBe(3);
  });

  it('reads Windows-1252 text, and unknown ear IDs are skipped or become stubs as chosen', async () => {
    const base = `/api/rabbitries/${r1}`;
    const csv = iconv.encode('ear_id,weighed_on,weight,notes\nFH3,2026-05-01,1 lb 4 oz,café scale\nZZ9,2026-05-01,600 g,\n', 'win1252');
    const up = await upload(owner, base, 'weights', csv);
    expect(up.body.encoding).toBe('windows-1252');
    const skipped = await check(owner, base, up.body.id, up.body.suggestedMapping, { unknownEarIds: 'skip' });
    expect(skipped.summary).toMatchObject({ newRows: 1, skippedRows: 1, stubsToCreate: 0 });
    const stubs = await check(owner, base, up.body.id, up.body.suggestedMapping, { unknownEarIds: 'create-stubs' });
    expect(stubs.summary).toMatchObject({ newRows: 2, skippedRows: 0, stubsToCreate: 1 });
    const done = await commit(owner, base, up.body.id);
    expect(done.body.status).toBe('done');
    const w = await t.db.query("SELECT w.grams, w.notes FROM weight_record w JOIN animal a ON a.id = w.animal_id WHERE a.ear_id = 'FH3'");
    expect(w[0]).toEqual({ grams: 567, notes: 'café scale' }); // 1 lb 4 oz = 20 × 28.349523125 g = 566.99 g
    expect((await t.db.query("SELECT is_stub FROM animal WHERE ear_id = 'ZZ9'"))[0].is_stub).toBe(1);
  });

  it('refuses empty, header-less and binary files with a clear message', async () => {
    const base = `/api/rabbitries/${r1}`;
    const empty = await upload(owner, base, 'animals', '');
    expect([empty.status, empty.body.error.code]).toEqual([400, 'empty-file']);
    const noHeader = await upload(owner, base, 'animals', '123,2026-01-01,456\n789,2026-01-02,12\n');
    expect([noHeader.status, noHeader.body.error.code]).toEqual([400, 'no-header']);
    const binary = await upload(owner, base, 'animals', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), 'photo.csv');
    expect([binary.status, binary.body.error.code]).toEqual([400, 'binary-file']);
  });

  it('loads show results with the bulk loader, matches members\' animals, and re-imports idempotently', async () => {
    const base = `/api/clubs/${c1}`;
    const csv = 'show_name,show_date,judge,ear_id,exhibitor,breed,variety,sex,age_class,entries_in_class,exhibitors_in_class,placing,awards\n' +
      'Spring Classic,2026-04-04,R. Judge,FH3,Marla Fenwick,Mini Rex,Black,doe,junior,6,3,1,BOV|BOB\n' +
      'Spring Classic,2026-04-04,R. Judge,Q77,Outside Person,Mini Rex,Black,doe,junior,6,3,2,\n' +
      'Spring Classic,2026-04-04,R. Judge,Q78,Outside Person,Mini Rex,Black,doe,junior,6,3,9,\n';
    const up = await upload(officer, base, 'results', csv);
    const checked = await check(officer, base, up.body.id, up.body.suggestedMapping);
    expect(checked.summary).toMatchObject({ totalRows: 3, newRows: 2, errorRows: 1 });
    expect(checked.summary.problems[0]).toMatchObject({ row: 4, field: 'placing' });
    const done = await commit(officer, base, up.body.id, { skipRowsWithErrors: true });
    expect(done.body.message).toBe('2 new, 0 already present');
    const rows = await t.db.query("SELECT sr.ear_id, sr.animal_id IS NOT NULL AS matched, sr.awards, s.name FROM show_result sr JOIN `show` s ON s.id = sr.show_id ORDER BY sr.placing");
    expect(rows.map((r: { ear_id: string; matched: number; awards: string }) => [r.ear_id, Number(r.matched), r.awards])).toEqual([['FH3', 1, 'BOV BOB'], ['Q77', 0, '']]);
    const again = await upload(officer, base, 'results', csv);
    const checked2 = await check(officer, base, again.body.id, again.body.suggestedMapping);
    expect(checked2.summary).toMatchObject({ newRows: 0, alreadyPresent: 2 });
    const done2 = await commit(officer, base, again.body.id, { skipRowsWithErrors: true });
    expect(done2.body.message).toBe('0 new, 2 already present');
    const history = await officer.agent.get(`${base}/imports`).expect(200);
    expect(history.body.imports).toHaveLength(2);
    const report = await officer.agent.get(`${base}/imports/${up.body.id}/problems.csv`).expect(200);
    expect(report.text).toContain('4,placing,error');
  });

  it('reports a share of the work strictly between 0 and 1 while a large results file is checked and imported', async () => {
    const base = `/api/clubs/${c1}`;
    const lines = ['show_name,show_date,judge,ear_id,exhibitor,breed,variety,sex,age_class,entries_in_class,exhibitors_in_class,placing,awards'];
    for (let i = 0; i < 150_000; i++) {
      lines.push(`Progress Show ${i % 40},2026-0${1 + (i % 9)}-1${i % 10},Judge ${i % 7},P${i},Exhibitor ${i % 300},Mini Rex,Black,${i % 2 ? 'buck' : 'doe'},junior,10,4,${1 + (i % 10)},`);
    }
    const up = await upload(officer, base, 'results', `${lines.join('\n')}\n`);
    expect(up.body.progress).toBeNull();
    const seen = { checking: [] as number[], committing: [] as number[] };
    const follow = async (id: number) => {
      for (;;) {
        const { body } = await officer.agent.get(`${base}/imports/${id}`).expect(200);
        if (body.status !== 'checking' && body.status !== 'committing') return body;
        seen[body.status as 'checking' | 'committing'].push(body.progress);
        await new Promise((r) => setTimeout(r, 5));
      }
    };
    await officer.agent.post(`${base}/imports/${up.body.id}/check`).set('x-csrf-token', officer.csrfToken).send({ mapping: up.body.suggestedMapping }).expect(202);
    const checked = await follow(up.body.id);
    expect(checked.summary).toMatchObject({ totalRows: 150_000, newRows: 150_000, errorRows: 0 });
    expect(checked.progress).toBeNull();
    await officer.agent.post(`${base}/imports/${up.body.id}/commit`).set('x-csrf-token', officer.csrfToken).send({}).expect(202);
    const done = await follow(up.body.id);
    expect(done.message).toBe('150000 new, 0 already present');
    for (const phase of ['checking', 'committing'] as const) {
      expect(seen[phase].some((p) => p > 0 && p < 1), `${phase}: ${seen[phase].join(' ')}`).toBe(true);
      expect([...seen[phase]].sort((a, b) => a - b)).toEqual(seen[phase]); // it never goes back
    }
  });

  it('offers the trait columns of the herd\'s breed templates and checks each score against its animal\'s template', async () => {
    const base = `/api/rabbitries/${r1}`;
    // An invented breed whose template has a trait the default template lacks.
    const marked = await t.db.getRepository(Breed).save({
      name: 'Test Marked', classScheme: 'four-class', varieties: ['Broken'], weightLimits: {}, sourceNote: 'invented for a test',
      evaluationTemplate: { traits: [{ key: 'markings', label: 'Markings', points: 25 }, { key: 'body_type', label: 'Body type', points: 40 }, { key: 'fur', label: 'Fur', points: 20 }] },
    });
    await t.db.query("INSERT INTO animal (rabbitry_id, ear_id, sex, breed_id) VALUES (?, 'TM1', 'doe', ?)", [r1, marked.id]);
    const csv = 'Tattoo,Date,Body type,Markings,Fur,Condition\n' +
      'FH1,2026-06-01,45,,30,10\n' + // Mini Rex (body type 50, fur 35, condition 15): fine
      'TM1,2026-06-01,38,22,18,\n' + // Test Marked: fine
      'TM1,2026-06-02,38,27,18,\n' + // markings above 25
      'FH2,2026-06-01,40,10,,\n' + // Mini Rex has no markings
      'TM1,2026-06-03,45,20,,\n' + // body type above Test Marked's 40 (though Mini Rex allows 50)
      'TM1,2026-06-04,30,20,,5\n'; // Test Marked has no condition
    const up = await upload(owner, base, 'evaluations', csv);
    expect(up.status).toBe(201);
    const traits = Object.fromEntries(up.body.evaluationTraits.map((tr: { key: string; points: number }) => [tr.key, tr.points]));
    expect(traits).toMatchObject({ body_type: 50, fur: 35, condition: 15, markings: 25 });
    expect(up.body.suggestedMapping).toMatchObject({ ear_id: 'Tattoo', evaluated_on: 'Date', body_type: 'Body type', markings: 'Markings', fur: 'Fur', condition: 'Condition' });
    const checked = await check(owner, base, up.body.id, up.body.suggestedMapping);
    expect(checked.summary).toMatchObject({ totalRows: 6, newRows: 2, errorRows: 4 });
    const errors = checked.summary.problems.filter((p: { severity: string }) => p.severity === 'error').map((p: { row: number; field: string }) => `${p.row}:${p.field}`);
    expect(errors).toEqual(['4:markings', '5:markings', '6:body_type', '7:condition']);
    expect(checked.summary.problems.find((p: { row: number }) => p.row === 5).message).toContain('Markings is not a trait of this animal\'s breed template');
    const done = await commit(owner, base, up.body.id, { skipRowsWithErrors: true });
    expect(done.body.message).toBe('2 new, 0 already present');
    const [tm1] = await t.db.query("SELECT e.scores FROM evaluation e JOIN animal a ON a.id = e.animal_id WHERE a.ear_id = 'TM1'");
    expect(typeof tm1.scores === 'string' ? JSON.parse(tm1.scores) : tm1.scores).toEqual({ markings: 22, body_type: 38, fur: 18 });
  });

  it('a member of the club cannot import results, a mentor cannot import animals', async () => {
    const member = await signIn(t.app, 'member@example.test');
    expect((await upload(member, `/api/clubs/${c1}`, 'results', 'a,b\n1,2\n')).status).toBe(403);
    const mentor = await signIn(t.app, 'mentor@example.test');
    expect((await upload(mentor, `/api/rabbitries/${r1}`, 'animals', 'a,b\n1,2\n')).status).toBe(403);
  });
});
