// Bundles the API's entry points with esbuild (tsc leaves the @shared alias unrewritten;
// esbuild inlines shared/ and keeps npm packages external).
import { build } from 'esbuild';

export async function buildApi() {
  await build({
    entryPoints: {
      server: 'analytics-api/src/server.ts',
      migrate: 'analytics-api/src/db/migrate.ts',
      'load-demo': 'analytics-api/src/demo/demo-cli.ts',
    },
    outdir: 'dist/api',
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    packages: 'external',
    sourcemap: true,
    tsconfig: 'analytics-api/tsconfig.json',
    logLevel: 'warning',
  });
}

if (import.meta.url === `file://${process.argv[1]}`) await buildApi();
