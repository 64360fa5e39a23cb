import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDemo } from '../../analytics-api/src/demo/load-demo';
import { resetDatabase, signIn, startTestApp, type TestApp } from '../support/test-app';
import { foundation } from './matrix/foundation-rows';
import { imports } from './matrix/imports-rows';
import { records } from './matrix/records-rows';
import { analytics } from './matrix/analytics-rows';
import { ACTORS, ALL_NAMES, EMAIL, VISIBLE, type Actor, type Ids, type MatrixFeature, type Row } from './matrix/matrix-types';

/**
 * Access matrix: every route × every role, allowed or refused, and no data of a rabbitry or
 * club the caller may not see in any answer. Every route that exists must have a row here
 * (the first test fails otherwise), so each new route joins the matrix.
 */
// One file per feature; a new feature adds its file here.
const FEATURES: MatrixFeature[] = [foundation, imports, records, analytics];
const MATRIX: Record<string, Row> = Object.assign({}, ...FEATURES.map((f) => f.rows));

let t: TestApp;
let ids: Ids;
let agents = new Map<Actor, { agent: TestAgent; csrf: string }>();

async function loadIds(): Promise<Ids> {
  const q = async (sql: string, arg: string) => Number((await t.db.query(sql, [arg]))[0].id);
  const users: { id: number; email: string }[] = await t.db.query('SELECT id, email FROM user');
  return {
    r1: await q('SELECT id FROM rabbitry WHERE name = ?', 'Fenwick Hollow'),
    r2: await q('SELECT id FROM rabbitry WHERE name = ?', 'Castellan Meadow'),
    c1: await q('SELECT id FROM club WHERE name = ?', 'Brackenford Valley Rabbit Club'),
    c2: await q('SELECT id FROM club WHERE name = ?', 'Lowmere Coast Fanciers'),
    user: (email) => users.find((u) => u.email === email)!.id,
    fixture: {},
  };
}

/** The demo's ids, plus whatever each feature's fixture adds. */
async function loadAll(): Promise<Ids> {
  const base = await loadIds();
  for (const f of FEATURES) if (f.fixture) Object.assign(base.fixture, await f.fixture(t.db, base));
  return base;
}

async function freshDemo() {
  await resetDatabase(t.db);
  await loadDemo(t.db);
  ids = await loadAll();
  agents = new Map();
}

async function agentFor(actor: Actor) {
  let a = agents.get(actor);
  if (!a) {
    if (actor === 'anonymous') {
      const agent = request.agent(t.app);
      a = { agent, csrf: (await agent.get('/api/csrf')).body.csrfToken };
    } else {
      const s = await signIn(t.app, EMAIL[actor]);
      a = { agent: s.agent, csrf: s.csrfToken };
    }
    agents.set(actor, a);
  }
  return a;
}

async function call(key: string, actor: Actor) {
  const row = MATRIX[key];
  const [method] = key.split(' ') as ['get' | 'post' | 'patch' | 'delete'];
  const { agent, csrf } = await agentFor(actor);
  let req = agent[method](row.path(ids));
  if (method !== 'get') req = req.set('x-csrf-token', csrf);
  return row.body ? req.send(row.body(ids, actor)) : req;
}

const REFUSED = [401, 403, 404];

beforeAll(async () => {
  t = await startTestApp();
  ids = await loadAll();
});
afterAll(async () => { await t.close(); });

describe('access matrix', () => {
  it('has a row for every route that exists', () => {
    const existing = t.routes.map((r) => `${r.method} ${r.path}`).sort();
    expect(existing).toEqual(Object.keys(MATRIX).sort());
  });

  for (const [key, row] of Object.entries(MATRIX)) {
    it(`${key}: allowed for ${row.allowed.join(', ')}; refused for the rest`, async () => {
      const refused = ACTORS.filter((a) => !row.allowed.includes(a));
      if (row.mutates) await freshDemo();
      for (const actor of refused) {
        const res = await call(key, actor);
        expect(REFUSED, `${actor} ${key} → ${res.status} ${JSON.stringify(res.body)}`).toContain(res.status);
        expect(res.body.error?.code).toMatch(/unauthenticated|bad-credentials|forbidden|not-found/);
      }
      for (const actor of row.allowed) {
        if (row.mutates) await freshDemo();
        const res = await call(key, actor);
        const ok = res.status < 300 || (row.expect ?? []).includes(res.status);
        expect(ok, `${actor} ${key} → ${res.status} ${JSON.stringify(res.body)}`).toBe(true);
        const text = JSON.stringify(res.body ?? '');
        for (const name of ALL_NAMES.filter((n) => !VISIBLE[actor].includes(n))) {
          expect(text, `${actor} ${key} leaks "${name}"`).not.toContain(name);
        }
      }
      if (row.mutates) await freshDemo();
    });
  }
});
