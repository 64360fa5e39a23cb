// Helpers shared by the start and test commands: dependency freshness, build freshness,
// local secrets, child processes. Node built-ins only (runs before npm install).
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, readdirSync, statSync, writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { log } from './mariadb.mjs';

export const root = new URL('..', import.meta.url).pathname.replace(/\/$/, '');

/** Installs npm dependencies when node_modules is missing or older than the lock file. */
export function ensureDependencies() {
  const marker = join(root, 'node_modules/.package-lock.json');
  const lock = join(root, 'package-lock.json');
  if (existsSync(marker) && statSync(marker).mtimeMs >= statSync(lock).mtimeMs) return;
  log('installing npm dependencies (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund']);
}

/** Newest modification time of any file below the given folders. */
export function newestMtime(paths) {
  let newest = 0;
  const walk = (p) => {
    if (!existsSync(p)) return;
    const s = statSync(p);
    if (s.isDirectory()) {
      for (const f of readdirSync(p)) if (f !== 'node_modules') walk(join(p, f));
    } else if (!p.endsWith('.spec.ts')) newest = Math.max(newest, s.mtimeMs);
  };
  paths.forEach((p) => walk(join(root, p)));
  return newest;
}

/** True when `output` is missing or older than any of `sources`. */
export function isStale(output, sources) {
  const out = join(root, output);
  return !existsSync(out) || statSync(out).mtimeMs < newestMtime(sources);
}

/** Secrets for the private database and sessions, generated once per data folder. */
export function localSecrets(dataDir) {
  const file = join(dataDir, 'secrets.json');
  if (existsSync(file)) return JSON.parse(readFileSync(file, 'utf8'));
  mkdirSync(dirname(file), { recursive: true });
  const secrets = { dbPassword: randomBytes(18).toString('base64url'), sessionSecret: randomBytes(32).toString('base64url') };
  writeFileSync(file, JSON.stringify(secrets, null, 2), { mode: 0o600 });
  return secrets;
}

export function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', cwd: root, ...opts });
  if (r.status !== 0) throw new Error(`${cmd} ${args.join(' ')} failed (exit ${r.status})`);
}

export function runAsync(cmd, args, opts = {}) {
  return new Promise((resolve) => {
    const child = spawn(cmd, args, { stdio: 'inherit', cwd: root, ...opts });
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

export const npx = (bin) => join(root, 'node_modules/.bin', bin);
