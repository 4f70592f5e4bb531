// The server side of the step-save benchmark, in its own process so the load generator does not
// share its event loop: Heatpath's real app on BENCH_APP_PORT, and the floor — a bare Express
// route doing one INSERT into the same PostgreSQL — on BENCH_FLOOR_PORT.
import express from 'express';
import pg from 'pg';
import { createApp } from '../src/app';
import { loadConfig } from '../src/config';
import { initModels } from '../src/db/models/index';
import { createSequelize } from '../src/db/sequelize';
import { createLogger } from '../src/lib/logger';

const config = loadConfig({ ...process.env, NODE_ENV: 'production', LOG_LEVEL: 'silent' });
const sequelize = createSequelize(config.databaseUrl, { poolMax: config.dbPoolMax });
initModels(sequelize);
const app = createApp({
  config: {
    ...config,
    signInLimits: {
      perAccount: 100_000,
      perDevice: 100_000,
      perAddress: 100_000,
      windowMinutes: 1,
    },
  },
  sequelize,
  logger: createLogger('silent'),
});

const pool = new pg.Pool({ connectionString: config.databaseUrl, max: config.dbPoolMax });
await pool.query(
  'CREATE TABLE IF NOT EXISTS bench_floor (id bigserial PRIMARY KEY, payload jsonb NOT NULL, created_at timestamptz NOT NULL DEFAULT now())',
);
const floor = express();
floor.use(express.json());
floor.post('/floor', async (req, res) => {
  await pool.query('INSERT INTO bench_floor (payload) VALUES ($1)', [req.body]);
  res.status(201).json({ ok: true });
});

const appPort = Number(process.env.BENCH_APP_PORT);
const floorPort = Number(process.env.BENCH_FLOOR_PORT);
app.listen(appPort, '127.0.0.1', () => {
  floor.listen(floorPort, '127.0.0.1', () => console.log('bench-server ready'));
});
