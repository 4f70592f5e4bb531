// Once per API test run: empty the throw-away test database and migrate it. scripts/test.mjs
// starts the cluster and passes DATABASE_URL; tests never touch the start command's data.
import { createSequelize } from '../db/sequelize';
import { migrateUp } from '../db/migrator';

export default async function setup(): Promise<void> {
  const url = process.env.DATABASE_URL;
  if (!url || !/_test(\?|$)/.test(new URL(url).pathname + (new URL(url).search || ''))) {
    throw new Error(
      'API tests need DATABASE_URL pointing at a *_test database: run them through `npm test`.',
    );
  }
  const sequelize = createSequelize(url, { poolMax: 2 });
  await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
  await migrateUp(sequelize);
  await sequelize.close();
}
