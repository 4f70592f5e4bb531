// GET /api/health: 200 when the database answers, 503 when it does not.
import { Router } from 'express';
import type { Sequelize } from 'sequelize';
import type { Health } from '@heatpath/contracts';

export function healthRouter(deps: { sequelize: Sequelize }) {
  const router = Router();
  router.get('/', async (_req, res) => {
    let db: Health['db'] = 'ok';
    try {
      await deps.sequelize.query('SELECT 1');
    } catch {
      db = 'down';
    }
    const body: Health = { status: db === 'ok' ? 'ok' : 'degraded', db };
    res.status(db === 'ok' ? 200 : 503).json(body);
  });
  return router;
}
