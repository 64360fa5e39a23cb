import { databaseUrlFromEnv } from '../config';
import { createDataSource } from './data-source';

/** Runs pending migrations (npm start and npm test call this before the API starts). */
const db = await createDataSource(databaseUrlFromEnv()).initialize();
const ran = await db.runMigrations({ transaction: 'each' });
console.log(`[keeperline] migrations: ${ran.length ? ran.map((m) => m.name).join(', ') : 'up to date'}`);
await db.destroy();
