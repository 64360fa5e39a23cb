import { createServer } from 'node:http';
import { createApp } from './app';
import { loadConfig } from './config';
import { createDataSource } from './db/data-source';

const config = loadConfig();
const db = await createDataSource(config.DATABASE_URL).initialize();
const { app, close } = createApp(config, db);
const server = createServer(app);

server.listen(config.PORT, config.HOST, () => {
  console.log(`[keeperline] API and dashboard on ${config.publicUrl}`);
});

// Graceful shutdown: stop accepting, finish requests in flight, then close the pools.
let stopping = false;
for (const signal of ['SIGTERM', 'SIGINT'] as const) {
  process.on(signal, () => {
    if (stopping) return;
    stopping = true;
    server.close(async () => {
      await close();
      await db.destroy();
      process.exit(0);
    });
    server.closeIdleConnections();
    setTimeout(() => process.exit(0), 5000).unref();
  });
}
