// The Sequelize instance for one database URL. Call initModels once on the instance the process
// serves from; a bare instance is enough for a connectivity check.
import { Sequelize } from 'sequelize';
import pg from 'pg';

export function createSequelize(
  databaseUrl: string,
  options: { poolMax?: number } = {},
): Sequelize {
  return new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: pg,
    logging: false,
    pool: { max: options.poolMax ?? 10, min: 0, idle: 10_000, acquire: 10_000 },
    define: { underscored: true },
  });
}
