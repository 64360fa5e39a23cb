import type { DataSource } from 'typeorm';
import { PUBLIC } from '../access/access-rules';
import type { RouteRegistrar } from '../access/route-registrar';

export function registerHealthRoutes(r: RouteRegistrar, db: DataSource): void {
  r.add('get', '/health', PUBLIC, async (_req, res) => {
    await db.query('SELECT 1');
    res.json({ status: 'ok', database: 'ok' });
  });
}
