import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync } from 'node:fs';
import { createServer } from 'node:net';
import type { TestProject } from 'vitest/node';

/**
 * Starts the app as `npm start` would (migrations ran in scripts/test.mjs; the demo loads into
 * the empty e2e database), on a free port, and hands its URL to the tests.
 */
let server: ChildProcess | undefined;

const freePort = () => new Promise<number>((resolve) => {
  const s = createServer().listen(0, '127.0.0.1', () => {
    const { port } = s.address() as { port: number };
    s.close(() => resolve(port));
  });
});

function runOnce(args: string[], env: NodeJS.ProcessEnv) {
  return new Promise<void>((resolve, reject) => {
    const c = spawn('node_modules/.bin/tsx', args, { env, stdio: 'inherit' });
    c.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`${args.join(' ')} exited ${code}`))));
  });
}

export default async function setup(project: TestProject) {
  const databaseUrl = process.env.E2E_DATABASE_URL;
  if (!databaseUrl) throw new Error('E2E_DATABASE_URL is not set: run the browser tests through `npm test`');
  if (!existsSync('dist/dashboard/browser/index.html')) throw new Error('The dashboard is not built: run `npx ng build dashboard`');
  const port = await freePort();
  const env = {
    ...process.env, NODE_ENV: 'production' as const, DATABASE_URL: databaseUrl, PORT: String(port),
    SESSION_SECRET: 'e2e-secret-e2e-secret-e2e-secret-e2e!', DATA_DIR: `${process.env.TMPDIR ?? '/tmp'}/kl-e2e-data`,
    DASHBOARD_DIST: 'dist/dashboard/browser',
  };
  const tsx = ['--tsconfig', 'analytics-api/tsconfig.json'];
  await runOnce([...tsx, 'analytics-api/src/demo/demo-cli.ts'], env);
  server = spawn('node_modules/.bin/tsx', [...tsx, 'analytics-api/src/server.ts'], { env, stdio: ['ignore', 'inherit', 'inherit'] });
  const baseUrl = `http://127.0.0.1:${port}`;
  for (let i = 0; ; i++) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) break;
    } catch { /* not listening yet */ }
    if (i > 300) throw new Error('the app did not start within 60 s');
    await new Promise((r) => setTimeout(r, 200));
  }
  project.provide('baseUrl', baseUrl);
  return async () => {
    server?.kill('SIGTERM');
    await new Promise((r) => server?.once('exit', r));
  };
}

declare module 'vitest' {
  export interface ProvidedContext { baseUrl: string }
}
