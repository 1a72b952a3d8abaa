import { Router } from 'express';
import type { Sequelize } from 'sequelize';

/** `GET /api/health`: the API is up, and whether the database answers (503 when it does not). */
export function healthRoutes(sequelize: Sequelize, timeoutMs: number): Router {
  const router = Router();
  router.get('/health', async (_req, res) => {
    const started = performance.now();
    try {
      await Promise.race([
        sequelize.query('SELECT 1'),
        new Promise((_, reject) => setTimeout(() => reject(new Error('timed out')), timeoutMs)),
      ]);
      res.json({ status: 'ok', database: { state: 'up', latencyMs: Math.round((performance.now() - started) * 10) / 10 } });
    } catch (error) {
      res.status(503).json({
        status: 'degraded',
        database: { state: 'down', message: error instanceof Error ? error.message : String(error) },
        error: { code: 'database_unavailable', message: 'The database is not reachable right now.' },
      });
    }
  });
  return router;
}
