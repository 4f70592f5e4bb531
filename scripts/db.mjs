// `npm run db:migrate | db:seed | db:reset` against the start command's private cluster.
import { join } from 'node:path';
import { startCluster } from './lib/postgres.mjs';
import { fail } from './lib/log.mjs';
import { mustRun, root } from './lib/run.mjs';

const commands = {
  migrate: ['migrate', 'update-shipped-trees'],
  seed: ['seed-demo'],
  reset: ['reset', 'migrate', 'seed-demo'],
};

async function main() {
  const which = process.argv[2];
  const steps = commands[which];
  if (!steps) throw new Error(`Use one of: ${Object.keys(commands).join(', ')}`);
  const db = await startCluster({
    dataDir: join(root, '.data', 'pg'),
    port: Number(process.env.PGPORT ?? 54329),
    database: process.env.PGDATABASE ?? 'heatpath',
  });
  const env = {
    ...process.env,
    NODE_ENV: 'development',
    DATABASE_URL: db.url,
    HEATPATH_DEMO: 'true',
  };
  try {
    for (const s of steps) {
      await mustRun(process.execPath, ['--import', 'tsx', 'src/db/cli.ts', s], `${s} failed.`, {
        cwd: join(root, 'apps', 'api'),
        env,
      });
    }
  } finally {
    db.stop();
  }
}

main().catch(fail);
