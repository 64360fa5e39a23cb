import request from 'supertest';
import type TestAgent from 'supertest/lib/agent';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { loadDemo } from '../../analytics-api/src/demo/load-demo';
import { resetDatabase, signIn, startTestApp, type TestApp } from '../support/test-app';

/**
 * Access matrix: every route × every role, allowed or refused, and no data of a rabbitry or
 * club the caller may not see in any answer. Every route that exists must have a row here
 * (the first test fails otherwise), so each new route joins the matrix.
 */
type Actor = 'anonymous' | 'admin' | 'owner' | 'partner' | 'mentor' | 'officer' | 'member' | 'other-club';
const ACTORS: Actor[] = ['anonymous', 'admin', 'owner', 'partner', 'mentor', 'officer', 'member', 'other-club'];
const SIGNED_IN: Actor[] = ACTORS.filter((a) => a !== 'anonymous');

interface Ids { r1: number; r2: number; c1: number; c2: number; user: (email: string) => number }
interface Row {
  allowed: Actor[];
  path: (ids: Ids) => string;
  body?: (ids: Ids, actor: Actor) => object;
  /** Changes state: each allowed actor gets a freshly loaded demo. */
  mutates?: boolean;
}

// Demo layout (analytics-api/src/demo/load-demo.ts): rabbitry r1 "Fenwick Hollow" has owner,
// partner and mentor; r2 "Castellan Meadow" is owned by the officer. Club c1 has the officer,
// the owner and the member; c2 belongs to other-club alone.
const MATRIX: Record<string, Row> = {
  'get /health': { allowed: ACTORS, path: () => '/api/health' },
  'get /csrf': { allowed: ACTORS, path: () => '/api/csrf' },
  // Signing in is allowed to whoever holds the account's password; without it, 401.
  'post /session': {
    allowed: SIGNED_IN, path: () => '/api/session', mutates: true,
    body: (_i, actor) => (actor === 'anonymous' ? { email: 'owner@example.test', password: 'not-the-password' } : { email: EMAIL[actor], password: 'keeperline-demo' }),
  },
  'get /session': { allowed: SIGNED_IN, path: () => '/api/session' },
  'delete /session': { allowed: SIGNED_IN, path: () => '/api/session', mutates: true },
  'patch /me/preferences': { allowed: SIGNED_IN, path: () => '/api/me/preferences', body: () => ({ weightUnit: 'kg' }), mutates: true },
  'get /rabbitries': { allowed: SIGNED_IN, path: () => '/api/rabbitries' },
  'post /rabbitries': { allowed: SIGNED_IN, path: () => '/api/rabbitries', body: () => ({ name: 'Matrix Test Herd' }), mutates: true },
  'get /rabbitries/:rabbitryId': { allowed: ['admin', 'owner', 'partner', 'mentor'], path: (i) => `/api/rabbitries/${i.r1}` },
  'patch /rabbitries/:rabbitryId': { allowed: ['admin', 'owner', 'partner'], path: (i) => `/api/rabbitries/${i.r1}`, body: () => ({ location: 'Elsewhere' }), mutates: true },
  'delete /rabbitries/:rabbitryId': { allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}`, mutates: true },
  'get /rabbitries/:rabbitryId/members': { allowed: ['admin', 'owner', 'partner', 'mentor'], path: (i) => `/api/rabbitries/${i.r1}/members` },
  'post /rabbitries/:rabbitryId/members': {
    allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}/members`,
    body: () => ({ email: 'member@example.test', role: 'mentor' }), mutates: true,
  },
  'delete /rabbitries/:rabbitryId/members/:userId': {
    allowed: ['admin', 'owner'], path: (i) => `/api/rabbitries/${i.r1}/members/${i.user('mentor@example.test')}`, mutates: true,
  },
  'get /clubs': { allowed: SIGNED_IN, path: () => '/api/clubs' },
  'get /clubs/:clubId': { allowed: ['admin', 'officer', 'owner', 'member'], path: (i) => `/api/clubs/${i.c1}` },
  'get /clubs/:clubId/members': { allowed: ['admin', 'officer', 'owner', 'member'], path: (i) => `/api/clubs/${i.c1}/members` },
  'post /clubs/:clubId/members': {
    allowed: ['admin', 'officer'], path: (i) => `/api/clubs/${i.c1}/members`,
    body: () => ({ email: 'partner@example.test', role: 'member' }), mutates: true,
  },
  'delete /clubs/:clubId/members/:userId': {
    allowed: ['admin', 'officer'], path: (i) => `/api/clubs/${i.c1}/members/${i.user('member@example.test')}`, mutates: true,
  },
};

// What each actor may see; every other rabbitry or club name must be absent from its answers.
const VISIBLE: Record<Actor, string[]> = {
  anonymous: [],
  admin: ['Fenwick Hollow', 'Castellan Meadow', 'Brackenford Valley Rabbit Club', 'Lowmere Coast Fanciers'],
  owner: ['Fenwick Hollow', 'Brackenford Valley Rabbit Club'],
  partner: ['Fenwick Hollow'],
  mentor: ['Fenwick Hollow'],
  officer: ['Castellan Meadow', 'Brackenford Valley Rabbit Club'],
  member: ['Brackenford Valley Rabbit Club'],
  'other-club': ['Lowmere Coast Fanciers'],
};
const ALL_NAMES = VISIBLE.admin;
const EMAIL: Record<Exclude<Actor, 'anonymous'>, string> = {
  admin: 'admin@example.test', owner: 'owner@example.test', partner: 'partner@example.test', mentor: 'mentor@example.test',
  officer: 'officer@example.test', member: 'member@example.test', 'other-club': 'other-club@example.test',
};

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
  };
}

async function freshDemo() {
  await resetDatabase(t.db);
  await loadDemo(t.db);
  ids = await loadIds();
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
  ids = await loadIds();
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
        expect(res.status, `${actor} ${key} → ${res.status} ${JSON.stringify(res.body)}`).toBeLessThan(300);
        const text = JSON.stringify(res.body ?? '');
        for (const name of ALL_NAMES.filter((n) => !VISIBLE[actor].includes(n))) {
          expect(text, `${actor} ${key} leaks "${name}"`).not.toContain(name);
        }
      }
      if (row.mutates) await freshDemo();
    });
  }
});
