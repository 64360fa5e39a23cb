// `npm run bench:web`: the dashboard's download sizes, figures and ratios, no pass/fail.
// Uses the production build in dist/dashboard when it is newer than every source and has the
// build's stats (esbuild metafile, `--stats-json`); otherwise builds it first. Prints:
// - initial JavaScript: the files index.html loads at once (script tags and modulepreload
//   links), raw and gzip-compressed (node:zlib, level 9 as a static server would precompress),
//   against the goal of at most 300 kB compressed;
// - every lazy chunk, raw and compressed, named by the route or component it holds (the route
//   files' lazy imports matched with the metafile's entry points), or by what it bundles.
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { dirname, join, normalize, relative } from 'node:path';
import { gzipSync } from 'node:zlib';
import { isStale, root, run } from './workspace.mjs';

const GOAL_GZIP = 300 * 1000;
const DIST = join(root, 'dist/dashboard');
const BROWSER = join(DIST, 'browser');
const STATS = join(DIST, 'stats.json');
const SOURCES = ['dashboard/src', 'shared', 'angular.json', 'package-lock.json'];

const kB = (bytes) => `${(bytes / 1000).toFixed(1)} kB`;
const pad = (text, width) => String(text).padEnd(width);
const padStart = (text, width) => String(text).padStart(width);

/** The files index.html loads eagerly: module scripts and modulepreload links, in page order. */
function eagerScripts(html) {
  const files = [];
  const tag = /<(script|link)\b[^>]*>/gi;
  for (const [element, name] of html.matchAll(tag)) {
    const attr = (key) => new RegExp(`\\b${key}\\s*=\\s*["']([^"']+)["']`, 'i').exec(element)?.[1];
    const url = name.toLowerCase() === 'script' ? attr('src') : attr('rel')?.toLowerCase() === 'modulepreload' ? attr('href') : undefined;
    if (url && !/^[a-z]+:/i.test(url) && !files.includes(url)) files.push(url.replace(/^\//, ''));
  }
  return files;
}

/**
 * Route addresses of lazily loaded files, from the route files' source: each `import('…')` gets
 * the paths of the route objects around it, and a spread `...NAME` hands its position on to the
 * constant NAME declared in another route file. Plain text scanning: enough for route tables.
 */
function lazyRoutes() {
  const app = join(root, 'dashboard/src/app');
  const files = [join(app, 'app.routes.ts'), ...findFiles(app, (f) => /routes\.ts$/.test(f) && !f.endsWith('app.routes.ts'))];
  const prefixes = new Map();
  const routes = new Map();
  for (const file of files) {
    const text = readFileSync(file, 'utf8');
    const stack = [];
    let base = [];
    const token = /\{|\}|\bpath:\s*'([^']*)'|import\('([^']+)'\)|\.\.\.([A-Z][A-Z0-9_]*)|export const ([A-Z][A-Z0-9_]*)/g;
    for (const m of text.matchAll(token)) {
      const here = () => [...base, ...stack.map((f) => f.path).filter((p) => p)];
      if (m[0] === '{') stack.push({ path: null });
      else if (m[0] === '}') stack.pop();
      else if (m[1] !== undefined && stack.length) stack.at(-1).path = m[1];
      else if (m[2] !== undefined) {
        const target = relative(root, normalize(join(dirname(file), m[2]))) + '.ts';
        routes.set(target, [...(routes.get(target) ?? []), '/' + here().join('/')]);
      } else if (m[3] !== undefined) prefixes.set(m[3], here());
      else if (m[4] !== undefined) base = prefixes.get(m[4]) ?? [];
    }
  }
  return routes;
}

function findFiles(dir, wanted) {
  const out = [];
  for (const name of readdirSync(dir)) {
    const path = join(dir, name);
    if (statSync(path).isDirectory()) out.push(...findFiles(path, wanted));
    else if (wanted(path)) out.push(path);
  }
  return out;
}

/** What a shared chunk bundles: its three biggest sources by package or app folder. */
function contentsOf(output) {
  const bytes = new Map();
  for (const [path, { bytesInOutput }] of Object.entries(output.inputs ?? {})) {
    const pkg = /node_modules\/((?:@[^/]+\/)?[^/]+)/.exec(path)?.[1];
    const app = /dashboard\/src\/app\/([^/]+)/.exec(path)?.[1];
    const key = pkg ?? (app ? `app/${app}` : path.startsWith('shared/') ? 'shared' : path);
    bytes.set(key, (bytes.get(key) ?? 0) + bytesInOutput);
  }
  const total = [...bytes.values()].reduce((a, b) => a + b, 0) || 1;
  return [...bytes].filter(([, b]) => b > 0).sort((a, b) => b[1] - a[1]).slice(0, 3).map(([k, b]) => `${k} ${Math.round((100 * b) / total)} %`).join(', ');
}

function buildIsFresh() {
  if (!existsSync(join(BROWSER, 'index.html')) || !existsSync(STATS)) return false;
  if (isStale('dist/dashboard/stats.json', SOURCES) || isStale('dist/dashboard/browser/index.html', SOURCES)) return false;
  // The stats must describe this very build: every file the page loads is among its outputs.
  const outputs = JSON.parse(readFileSync(STATS, 'utf8')).outputs;
  return eagerScripts(readFileSync(join(BROWSER, 'index.html'), 'utf8')).every((f) => f in outputs || !f.endsWith('.js'));
}

function main() {
  if (buildIsFresh()) console.log('Using the production build in dist/dashboard (newer than every source).');
  else {
    console.log('Building the dashboard for production (ng build dashboard --stats-json)…');
    run(process.platform === 'win32' ? 'npx.cmd' : 'npx', ['ng', 'build', 'dashboard', '--stats-json'], { env: { ...process.env, NG_CLI_ANALYTICS: 'false' } });
  }
  const outputs = JSON.parse(readFileSync(STATS, 'utf8')).outputs;
  const routes = lazyRoutes();
  const size = (file) => {
    const raw = readFileSync(join(BROWSER, file));
    return { file, raw: raw.length, gzip: gzipSync(raw, { level: 9 }).length };
  };
  const nameOf = (file) => {
    const out = outputs[file];
    if (!out) return '';
    if (out.entryPoint) {
      const entry = out.entryPoint.replace(/^dashboard\/src\/app\//, '');
      const route = routes.get(out.entryPoint);
      return route ? `${route.join(', ')} (${entry})` : entry;
    }
    return `shared: ${contentsOf(out) || 'glue between chunks'}`;
  };

  const html = readFileSync(join(BROWSER, 'index.html'), 'utf8');
  const initial = eagerScripts(html).filter((f) => f.endsWith('.js')).map(size);
  const css = eagerScripts(html).length ? [...html.matchAll(/<link\b[^>]*rel=["']stylesheet["'][^>]*href=["']([^"']+)["']/gi)].map((m) => size(m[1])) : [];
  const lazy = readdirSync(BROWSER).filter((f) => f.endsWith('.js') && !initial.some((i) => i.file === f)).map(size).sort((a, b) => b.gzip - a.gzip);
  const sum = (list, key) => list.reduce((n, x) => n + x[key], 0);

  const table = (title, rows, named) => {
    console.log(`\n${title}`);
    console.log(`  ${pad('file', 22)}${padStart('raw', 11)}${padStart('gzip', 11)}${padStart('gzip/raw', 10)}  ${named ? 'holds' : ''}`);
    for (const r of rows) {
      console.log(`  ${pad(r.file, 22)}${padStart(kB(r.raw), 11)}${padStart(kB(r.gzip), 11)}${padStart((r.gzip / r.raw).toFixed(2), 10)}  ${named ? nameOf(r.file) : ''}`);
    }
    console.log(`  ${pad(`total (${rows.length} files)`, 22)}${padStart(kB(sum(rows, 'raw')), 11)}${padStart(kB(sum(rows, 'gzip')), 11)}${padStart((sum(rows, 'gzip') / (sum(rows, 'raw') || 1)).toFixed(2), 10)}`);
  };

  console.log(`\nDashboard download sizes — dist/dashboard/browser, built ${statSync(join(BROWSER, 'index.html')).mtime.toISOString().slice(0, 16).replace('T', ' ')} UTC`);
  table('Initial JavaScript (index.html: scripts and modulepreload links)', initial, true);
  const gz = sum(initial, 'gzip');
  console.log(`  goal: ≤ ${kB(GOAL_GZIP)} compressed → ${kB(gz)} is ${(gz / GOAL_GZIP).toFixed(2)} of the goal (${kB(GOAL_GZIP - gz)} ${gz <= GOAL_GZIP ? 'to spare' : 'over'})`);
  if (css.length) table('Initial CSS (for reference, not counted in the goal)', css, false);
  table('Lazy chunks (largest compressed first)', lazy, true);
}

main();
