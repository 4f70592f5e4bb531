// `npm run fuzz`: a throw-away cluster in a private directory (PGPORT_FUZZ, or the first free
// port from 54359), then apps/api/bench/fuzz.ts with DATABASE_URL pointing at it. FUZZ_RUNS sets
// the requests per route (1,000), FUZZ_SEED repeats a run.
import { join } from 'node:path';
import { portIsFree, startCluster } from './lib/postgres.mjs';
import { installDependencies } from './lib/install.mjs';
import { BootstrapError, fail } from './lib/log.mjs';
import { mustRun, root } from './lib/run.mjs';

async function freePort(start) {
  for (let p = start; p < start + 200; p += 1) if (await portIsFree(p)) return p;
  throw new BootstrapError(`No free port found near ${start}: set PGPORT_FUZZ.`);
}

async function main() {
  await installDependencies();
  const port = Number(process.env.PGPORT_FUZZ ?? (await freePort(54359)));
  const db = await startCluster({
    dataDir: join(root, '.data', `fuzz-pg-${port}`),
    port,
    database: 'heatpath_fuzz_test',
    scratch: true,
    fast: true,
  });
  try {
    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'bench/fuzz.ts'],
      'Fuzzing found answers that must not happen; see above.',
      {
        cwd: join(root, 'apps', 'api'),
        env: {
          ...process.env,
          DATABASE_URL: db.url,
          SESSION_SECRET: 'heatpath-fuzz-session-secret-0123456789',
        },
      },
    );
  } finally {
    db.stop();
    db.remove();
  }
}

main().catch(fail);
