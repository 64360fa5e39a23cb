// Lifecycle of a private MariaDB instance bound to 127.0.0.1, with its data folder inside the
// project. Used by `npm start` (persistent, .data/mariadb) and `npm test` (throwaway, .tmp/).
// Only Node built-ins here: this runs before or right after `npm install`.
import { spawn, spawnSync, execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, openSync } from 'node:fs';
import { createServer } from 'node:net';
import { join, resolve } from 'node:path';

export const log = (msg) => console.log(`[keeperline] ${msg}`);

function which(cmd) {
  const r = spawnSync('sh', ['-c', `command -v ${cmd}`], { encoding: 'utf8' });
  return r.status === 0 ? r.stdout.trim() : null;
}

/** Installs Debian's mariadb-server when missing (root only); otherwise says what to run. */
export function ensureMariadbInstalled() {
  if (which('mariadbd') || existsSync('/usr/sbin/mariadbd')) return;
  if (process.getuid?.() !== 0) {
    console.error('MariaDB is not installed. Run this once, then try again:\n  sudo apt-get install -y mariadb-server');
    process.exit(1);
  }
  log('installing MariaDB (apt-get install mariadb-server)…');
  installDebianPackages(['mariadb-server']);
}

export function installDebianPackages(packages) {
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  execFileSync('apt-get', ['update', '-q'], { stdio: 'inherit', env });
  execFileSync('apt-get', ['install', '-y', '-q', ...packages], { stdio: 'inherit', env });
}

/** A free TCP port on loopback, for throwaway instances. */
export function freePort() {
  return new Promise((res, rej) => {
    const srv = createServer();
    srv.once('error', rej);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address();
      srv.close(() => res(port));
    });
  });
}

const mariadbd = () => which('mariadbd') ?? '/usr/sbin/mariadbd';

/**
 * Starts mariadbd on `port` with data in `dataDir` (initialised on first use) and resolves
 * once it answers. Returns { socket, stop() }.
 */
export async function startMariadb({ dataDir, port }) {
  dataDir = resolve(dataDir);
  const socket = join(dataDir, 'mysqld.sock');
  if (!existsSync(join(dataDir, 'mysql'))) {
    log(`initialising a new MariaDB data folder in ${dataDir}`);
    mkdirSync(dataDir, { recursive: true });
    execFileSync('mariadb-install-db', [
      '--no-defaults', `--datadir=${dataDir}`, '--user=root',
      '--auth-root-authentication-method=normal', '--skip-test-db',
    ], { stdio: ['ignore', 'ignore', 'inherit'] });
  }
  if (await answers(socket)) {
    log(`MariaDB already running on ${dataDir}; reusing it`);
    return { socket, stop: async () => {} };
  }
  log(`starting MariaDB on 127.0.0.1:${port}`);
  const errLog = openSync(join(dataDir, 'mariadbd.err'), 'a');
  const child = spawn(mariadbd(), [
    '--no-defaults', `--datadir=${dataDir}`, `--socket=${socket}`, `--port=${port}`,
    '--bind-address=127.0.0.1', '--user=root', `--pid-file=${join(dataDir, 'mariadbd.pid')}`,
    '--local-infile=1', '--max-connections=300', '--innodb-buffer-pool-size=512M',
    '--innodb-flush-log-at-trx-commit=2', '--max-allowed-packet=64M', '--skip-name-resolve',
  ], { stdio: ['ignore', 'ignore', errLog], detached: true });
  let exited = false;
  child.on('exit', () => { exited = true; });
  for (let i = 0; i < 300; i++) {
    if (exited) throw new Error(`mariadbd exited at start; see ${join(dataDir, 'mariadbd.err')}`);
    if (await answers(socket)) break;
    await new Promise((r) => setTimeout(r, 100));
    if (i === 299) throw new Error('MariaDB did not answer within 30 s');
  }
  const stop = async () => {
    if (exited) return;
    spawnSync('mariadb-admin', ['--no-defaults', '-uroot', '-S', socket, 'shutdown'], { stdio: 'ignore' });
    for (let i = 0; i < 200 && !exited; i++) await new Promise((r) => setTimeout(r, 100));
    if (!exited) child.kill('SIGKILL');
  };
  return { socket, stop };
}

async function answers(socket) {
  if (!existsSync(socket)) return false;
  const r = spawnSync('mariadb-admin', ['--no-defaults', '-uroot', '-S', socket, 'ping'], { stdio: 'ignore' });
  return r.status === 0;
}

/** Runs SQL as root through the socket (setup only; the app never connects as root). */
export function rootSql(socket, sql) {
  execFileSync('mariadb', ['--no-defaults', '-uroot', '-S', socket, '-e', sql], { stdio: ['ignore', 'ignore', 'inherit'] });
}

/** Creates the database and the application user (idempotent). */
export function ensureDatabase(socket, { database, user, password }) {
  const q = (s) => s.replace(/[\\']/g, (c) => `\\${c}`);
  rootSql(socket, [
    `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    `CREATE USER IF NOT EXISTS '${q(user)}'@'127.0.0.1' IDENTIFIED BY '${q(password)}';`,
    `ALTER USER '${q(user)}'@'127.0.0.1' IDENTIFIED BY '${q(password)}';`,
    `GRANT ALL PRIVILEGES ON \`${database}\`.* TO '${q(user)}'@'127.0.0.1';`,
    'FLUSH PRIVILEGES;',
  ].join(' '));
}
