// Database chores for the bootstrap scripts: `migrate`, `seed-demo` (only on an empty
// database), `update-shipped-trees` (publish Heatpath's current trees where a workshop still
// has an earlier shipped version) and `reset` (drop everything; development and test only).
import { loadConfig } from '../config';
import { createDiskFileStore } from '../lib/storage/disk-file-store';
import { initModels } from './models/index';
import { migrateUp } from './migrator';
import { createSequelize } from './sequelize';
import { seedDemo } from './seeders/demo';
import { updateShippedTrees } from '../services/trees/update-shipped-trees';

const command = process.argv[2];
const config = loadConfig();
const sequelize = createSequelize(config.databaseUrl, { poolMax: 4 });
initModels(sequelize);

async function main(): Promise<void> {
  switch (command) {
    case 'migrate': {
      const done = await migrateUp(sequelize);
      console.log(
        done.length
          ? `✓ Applied migrations: ${done.join(', ')}`
          : '✓ Database schema is up to date.',
      );
      break;
    }
    case 'seed-demo': {
      const seeded = await seedDemo(sequelize, { store: createDiskFileStore(config.uploadDir) });
      console.log(
        seeded ? '✓ Seeded the demo workshops.' : '✓ Demo data already present; left as it is.',
      );
      break;
    }
    case 'update-shipped-trees': {
      const changes = await updateShippedTrees({ sequelize });
      const updated = changes.filter((c) => c.change === 'updated' || c.change === 'installed');
      const kept = changes.filter((c) => c.change === 'kept-lead-edits');
      console.log(
        updated.length
          ? `✓ Shipped trees brought up to date: ${updated.map((c) => (c.change === 'updated' ? `${c.treeKey} v${c.version}` : `${c.treeKey} installed`)).join(', ')}.`
          : '✓ Shipped trees are up to date.',
      );
      if (kept.length)
        console.log(
          `  ${kept.length} tree(s) edited by a workshop lead were left as they are; the lead can compare them with Heatpath’s current trees.`,
        );
      break;
    }
    case 'reset': {
      if (config.env === 'production') throw new Error('Refusing to reset a production database.');
      await sequelize.query('DROP SCHEMA public CASCADE; CREATE SCHEMA public;');
      console.log('✓ Database emptied.');
      break;
    }
    default:
      throw new Error(
        `Unknown command "${command}". Use migrate, seed-demo, update-shipped-trees or reset.`,
      );
  }
}

main()
  .then(() => sequelize.close())
  .catch(async (error: unknown) => {
    console.error(`✗ ${error instanceof Error ? error.message : String(error)}`);
    await sequelize.close();
    process.exit(1);
  });
