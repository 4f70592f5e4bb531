// Heatpath's process: read config, connect to PostgreSQL, serve the app, stop cleanly.
import { resolve } from 'node:path';
import { createApp } from './app';
import { loadConfig } from './config';
import { initModels } from './db/models/index';
import { createSequelize } from './db/sequelize';
import { createLogger } from './lib/logger';

const config = loadConfig();
const logger = createLogger(config.logLevel);
const sequelize = createSequelize(config.databaseUrl, { poolMax: config.dbPoolMax });
initModels(sequelize);

const app = createApp({
  config: { ...config, webDist: config.webDist ?? resolve(import.meta.dirname, '../../web/dist') },
  sequelize,
  logger,
});

const server = app.listen(config.port, config.host, (error?: Error) => {
  if (error) {
    logger.fatal({ err: error }, 'could not listen');
    process.exit(1);
  }
  logger.info({ url: `http://${config.host}:${config.port}` }, 'listening');
});

let stopping = false;
function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'stopping');
  server.close(() => {
    void sequelize.close().finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGINT', () => stop('SIGINT'));
process.on('SIGTERM', () => stop('SIGTERM'));
