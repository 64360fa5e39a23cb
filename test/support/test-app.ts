import request from 'supertest';
import type { DataSource } from 'typeorm';
import { createApp, type AppContext } from '../../analytics-api/src/app';
import { loadConfig } from '../../analytics-api/src/config';
import { createDataSource } from '../../analytics-api/src/db/data-source';
import { DEMO_PASSWORD } from '../../analytics-api/src/demo/demo-accounts';
import { loadDemo } from '../../analytics-api/src/demo/load-demo';

export interface TestApp extends AppContext { db: DataSource }

/**
 * The real app on the throwaway MariaDB that `npm test` started, emptied and loaded with the
 * demo. Needs DATABASE_URL (set by scripts/test.mjs).
 */
export async function startTestApp(): Promise<TestApp> {
  const url = process.env.DATABASE_URL;
  if (!url) throw new Error('DATABASE_URL is not set: run the API tests through `npm test`');
  const config = loadConfig({ ...process.env, NODE_ENV: 'test', SESSION_SECRET: 'test-secret-test-secret-test-secret!', SIGNIN_RATE_LIMIT: '5', DASHBOARD_DIST: '/nonexistent' });
  const db = await createDataSource(url).initialize();
  await resetDatabase(db);
  await loadDemo(db);
  const ctx = createApp(config, db);
  return { ...ctx, db, close: async () => { await ctx.close(); await db.destroy(); } };
}

/** Empties every table but the migrations log. */
export async function resetDatabase(db: DataSource): Promise<void> {
  const tables: { t: string }[] = await db.query(
    "SELECT table_name AS t FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name <> 'migrations'");
  await db.query('SET FOREIGN_KEY_CHECKS = 0');
  for (const { t } of tables) await db.query(`TRUNCATE TABLE \`${t}\``);
  await db.query('SET FOREIGN_KEY_CHECKS = 1');
}

/** A supertest agent signed in as a demo account, sending the CSRF token on every write. */
export async function signIn(app: AppContext['app'], email: string) {
  const agent = request.agent(app);
  const { body: { csrfToken: first } } = await agent.get('/api/csrf').expect(200);
  const res = await agent.post('/api/session').set('x-csrf-token', first).send({ email, password: DEMO_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in as ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, csrfToken: res.body.csrfToken as string, user: res.body.user };
}
