import { databaseUrlFromEnv } from '../config';
import { createDataSource } from '../db/data-source';
import { isEmpty, loadDemo } from './load-demo';

/** `npm start` runs this after migrations: the demo is loaded only into an empty database. */
const db = await createDataSource(databaseUrlFromEnv()).initialize();
if (await isEmpty(db)) {
  console.log('[keeperline] empty database: loading the demo…');
  await loadDemo(db);
  console.log('[keeperline] demo loaded');
} else {
  console.log('[keeperline] database has data: demo not reloaded');
}
await db.destroy();
