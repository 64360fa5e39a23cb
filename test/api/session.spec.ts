import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../analytics-api/src/demo/demo-accounts';
import { signIn, startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => { t = await startTestApp(); });
afterAll(async () => { await t.close(); });

async function csrfAgent() {
  const agent = request.agent(t.app);
  const { body } = await agent.get('/api/csrf').expect(200);
  return { agent, token: body.csrfToken as string };
}

describe('sign-in', () => {
  it('signs in with the right password and lists the memberships', async () => {
    const { user } = await signIn(t.app, 'owner@example.test');
    expect(user.email).toBe('owner@example.test');
    expect(user.rabbitries.map((r: { name: string; role: string }) => `${r.name}:${r.role}`)).toEqual(['Fenwick Hollow:owner']);
    expect(user.clubs.map((c: { role: string }) => c.role)).toEqual(['member']);
  });

  it('refuses a wrong password with 401 and the one error shape', async () => {
    const { agent, token } = await csrfAgent();
    const res = await agent.post('/api/session').set('x-csrf-token', token).send({ email: 'owner@example.test', password: 'wrong' });
    expect(res.status).toBe(401);
    expect(res.body).toEqual({ error: { code: 'bad-credentials', message: expect.any(String) } });
  });

  it('names the bad field on invalid input', async () => {
    const { agent, token } = await csrfAgent();
    const res = await agent.post('/api/session').set('x-csrf-token', token).send({ email: 'not-an-email', password: '' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation');
    expect(Object.keys(res.body.error.details).sort()).toEqual(['email', 'password']);
  });

  it('refuses a state change without the CSRF token', async () => {
    const res = await request(t.app).post('/api/session').send({ email: 'owner@example.test', password: DEMO_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf');
  });

  it('regenerates the session id at sign-in', async () => {
    const { agent, token } = await csrfAgent();
    const before = (await agent.get('/api/csrf')).headers['set-cookie'];
    const res = await agent.post('/api/session').set('x-csrf-token', token).send({ email: 'mentor@example.test', password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    const after = String(res.headers['set-cookie']);
    const sid = (c: string) => /kl\.sid=([^;]+)/.exec(c)?.[1];
    expect(sid(after)).toBeTruthy();
    // The cookie set before sign-in (if any was re-sent) must differ from the new one.
    if (before) expect(sid(String(before))).not.toBe(sid(after));
    // The pre-sign-in token no longer works: it belonged to the old session.
    const stale = await agent.patch('/api/me/preferences').set('x-csrf-token', token).send({ weightUnit: 'kg' });
    expect(stale.status).toBe(403);
    const fresh = await agent.patch('/api/me/preferences').set('x-csrf-token', res.body.csrfToken).send({ weightUnit: 'kg' });
    expect(fresh.status).toBe(200);
    expect(fresh.body.user.weightUnit).toBe('kg');
  });

  it('signs out and the session no longer answers', async () => {
    const { agent, csrfToken } = await signIn(t.app, 'member@example.test');
    await agent.get('/api/session').expect(200);
    await agent.delete('/api/session').set('x-csrf-token', csrfToken).expect(204);
    const res = await agent.get('/api/session');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('rate-limits repeated failed sign-ins (limit 5 in tests)', async () => {
    const { agent, token } = await csrfAgent();
    const statuses: number[] = [];
    for (let i = 0; i < 7; i++) {
      const res = await agent.post('/api/session').set('x-csrf-token', token).send({ email: 'partner@example.test', password: `wrong-${i}` });
      statuses.push(res.status);
    }
    expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
    expect(statuses.slice(5)).toEqual([429, 429]);
  });

  it('sends security headers with a content security policy', async () => {
    const res = await request(t.app).get('/api/health').expect(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
    expect(res.headers['content-security-policy']).toContain("script-src 'self'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});
