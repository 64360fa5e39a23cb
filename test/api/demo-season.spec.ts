import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_DIR, loadDemoSeason } from '../../analytics-api/src/demo/load-demo-season';
import { resetDatabase, startTestApp, type TestApp } from '../support/test-app';

const scenario = JSON.parse(readFileSync(join(DEMO_DIR, 'scenario.json'), 'utf8'));
const csvRows = (file: string) => readFileSync(join(DEMO_DIR, file), 'utf8').trim().split('\n').length - 1;

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await resetDatabase(t.db);
  await loadDemoSeason(t.db);
}, 180_000);
afterAll(async () => { await t.close(); });

describe('demo season loaded through the importer', () => {
  it('holds every row of every demo file', async () => {
    for (const r of scenario.rabbitries) {
      const [{ id }] = await t.db.query('SELECT id FROM rabbitry WHERE slug = ?', [r.slug]);
      const count = async (sql: string) => Number((await t.db.query(sql, [id]))[0].n);
      expect(await count('SELECT COUNT(*) AS n FROM animal WHERE rabbitry_id = ?')).toBe(csvRows(`${r.slug}/animals.csv`));
      expect(await count('SELECT COUNT(*) AS n FROM litter WHERE rabbitry_id = ?')).toBe(csvRows(`${r.slug}/litters.csv`));
      expect(await count('SELECT COUNT(*) AS n FROM weight_record w JOIN animal a ON a.id = w.animal_id WHERE a.rabbitry_id = ?')).toBe(csvRows(`${r.slug}/weights.csv`));
      expect(await count('SELECT COUNT(*) AS n FROM evaluation e JOIN animal a ON a.id = e.animal_id WHERE a.rabbitry_id = ?')).toBe(csvRows(`${r.slug}/evaluations.csv`));
    }
    const [{ n }] = await t.db.query('SELECT COUNT(*) AS n FROM show_result');
    expect(Number(n)).toBe(csvRows('club/results.csv'));
  });

  it('links pedigrees, litters and members\' show entries', async () => {
    const [p] = await t.db.query('SELECT SUM(sire_id IS NOT NULL) AS withSire, SUM(litter_id IS NOT NULL) AS inLitter, COUNT(*) AS n FROM animal WHERE is_stub = 0');
    expect(Number(p.withSire) / Number(p.n)).toBeGreaterThan(0.9);
    expect(Number(p.inLitter) / Number(p.n)).toBeGreaterThan(0.8);
    // Every result shown by a member rabbitry is matched to one of its animals.
    const [m] = await t.db.query(`SELECT COUNT(*) AS n, SUM(sr.animal_id IS NOT NULL) AS matched FROM show_result sr
      JOIN club_membership cm ON cm.exhibitor_name = sr.exhibitor AND cm.rabbitry_id IS NOT NULL`);
    expect(Number(m.n)).toBeGreaterThan(100);
    expect(Number(m.matched)).toBe(Number(m.n));
    const shows = await t.db.query('SELECT COUNT(*) AS n FROM `show`');
    expect(Number(shows[0].n)).toBe(scenario.season.shows.length);
  });
});
