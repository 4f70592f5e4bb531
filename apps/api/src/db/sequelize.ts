// The Sequelize instance for one database URL. Call initModels once on the instance the process
// serves from; a bare instance is enough for a connectivity check.
import { Sequelize } from 'sequelize';
import pg from 'pg';

export interface PoolSettings {
  /** Connections per process; see DB_POOL_MAX in .env.example for how it was sized. */
  poolMax?: number;
  /** How long a request waits for a free connection before it gets 503. */
  acquireTimeoutMs?: number;
  /** How long opening a connection may take before the database counts as unreachable. */
  connectTimeoutMs?: number;
}

export function createSequelize(databaseUrl: string, options: PoolSettings = {}): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: pg,
    // Never log statements: their bound values are customers' notes and details.
    logging: false,
    logQueryParameters: false,
    pool: {
      max: options.poolMax ?? 10,
      min: 0,
      idle: 10_000,
      acquire: options.acquireTimeoutMs ?? 3_000,
    },
    dialectOptions: { connectionTimeoutMillis: options.connectTimeoutMs ?? 2_000 },
    define: { underscored: true },
  });
}
