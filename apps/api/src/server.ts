// Heatpath's process: read config, connect to PostgreSQL, serve the app, send the outbox's
// mail, stop cleanly.
import { resolve } from 'node:path';
import { createApp } from './app';
import { loadConfig } from './config';
import { initModels } from './db/models/index';
import { createSequelize } from './db/sequelize';
import { createLogger } from './lib/logger';
import { createMailContext } from './lib/mail/mail-context';
import { createSmtpSender } from './lib/mail/mail-sender';
import { createOutboxWorker } from './lib/mail/outbox-worker';

const config = loadConfig();
const logger = createLogger(config.logLevel);
const sequelize = createSequelize(config.databaseUrl, config.dbPool);
initModels(sequelize);

const mail = createMailContext({ publicUrl: config.mail.publicUrl, secret: config.sessionSecret });
const app = createApp({
  config: { ...config, webDist: config.webDist ?? resolve(import.meta.dirname, '../../web/dist') },
  sequelize,
  logger,
  mail,
});

// Every process may run the worker: claims skip what another process holds.
const worker = config.mail.worker.enabled
  ? createOutboxWorker({
      sequelize,
      sender: createSmtpSender(config.mail),
      mail,
      from: config.mail.from,
      settings: config.mail.worker,
      serverLabel: `${config.mail.host}:${config.mail.port}`,
      logger: logger.child({ component: 'outbox' }),
    })
  : null;
worker?.start();

const server = app.listen(config.port, config.host, (error?: Error) => {
  if (error) {
    logger.fatal({ err: error }, 'could not listen');
    process.exit(1);
  }
  logger.info(
    {
      url: `http://${config.host}:${config.port}`,
      mail: worker ? `${config.mail.host}:${config.mail.port}` : 'worker off',
    },
    'listening',
  );
});

let stopping = false;
function stop(signal: string) {
  if (stopping) return;
  stopping = true;
  logger.info({ signal }, 'stopping');
  server.close(() => {
    void (worker?.stop() ?? Promise.resolve())
      .catch(() => undefined)
      .then(() => sequelize.close())
      .finally(() => process.exit(0));
  });
  setTimeout(() => process.exit(0), 5000).unref();
}
process.on('SIGINT', () => stop('SIGINT'));
process.on('SIGTERM', () => stop('SIGTERM'));
