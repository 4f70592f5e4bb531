// `npm run bench:step-save | bench:case-list | bench:load`: a fresh benchmark cluster in a
// private temporary directory (normal durability, unlike the test cluster), then the named
// benchmark with DATABASE_URL pointing at it.
import { join } from 'node:path';
import { startCluster } from './lib/postgres.mjs';
import { installDependencies } from './lib/install.mjs';
import { fail } from './lib/log.mjs';
import { mustRun, root } from './lib/run.mjs';

const benches = {
  'step-save': ['apps/api', 'bench/step-save.bench.ts'],
  'case-list': ['apps/api', 'bench/case-list.bench.ts'],
  load: ['apps/api', 'bench/load.bench.ts'],
};

async function main() {
  const bench = benches[process.argv[2]];
  if (!bench) throw new Error(`Use one of: ${Object.keys(benches).join(', ')}`);
  await installDependencies();
  const db = await startCluster({
    dataDir: join(root, '.data', 'bench-pg'),
    port: Number(process.env.PGPORT_BENCH ?? 54349),
    database: 'heatpath_bench',
    scratch: true,
  });
  try {
    await mustRun(
      process.execPath,
      [
        ...(process.env.BENCH_NODE_FLAGS ? process.env.BENCH_NODE_FLAGS.split(' ') : []),
        '--import',
        'tsx',
        bench[1],
      ],
      'The benchmark failed.',
      {
        cwd: join(root, bench[0]),
        env: {
          ...process.env,
          DATABASE_URL: db.url,
          SESSION_SECRET: 'heatpath-bench-session-secret-0123456789',
        },
      },
    );
  } finally {
    db.stop();
    db.remove();
  }
}

main().catch(fail);
