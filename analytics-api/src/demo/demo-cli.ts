import { databaseUrlFromEnv } from '../config';
import { createDataSource } from '../db/data-source';
import { isEmpty } from './load-demo';
import { loadDemoSeason } from './load-demo-season';

/** `npm start` runs this after migrations: the demo season is loaded only into an empty database. */
const db = await createDataSource(databaseUrlFromEnv()).initialize();
if (await isEmpty(db)) {
  console.log('[keeperline] empty database: loading the demo season through the importer…');
  const t0 = Date.now();
  await loadDemoSeason(db, (m) => console.log(`[keeperline]   ${m}`));
  console.log(`[keeperline] demo loaded in ${((Date.now() - t0) / 1000).toFixed(1)} s`);
} else {
  console.log('[keeperline] database has data: demo not reloaded');
}
await db.destroy();
