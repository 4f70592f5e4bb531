// `npm run dev`: the start command's database, the API under tsx watch on PORT (default 3000),
// Vite's dev server on 5173 proxying /api to it, and the local mail fake. For working on
// Heatpath, not for serving.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { ensureSecret, startCluster } from './lib/postgres.mjs';
import { installDependencies } from './lib/install.mjs';
import { fail, ok } from './lib/log.mjs';
import { mustRun, pnpm, root } from './lib/run.mjs';

async function main() {
  await installDependencies();
  const db = await startCluster({
    dataDir: join(root, '.data', 'pg'),
    port: Number(process.env.PGPORT ?? 54329),
    database: process.env.PGDATABASE ?? 'heatpath',
  });
  const env = {
    ...process.env,
    NODE_ENV: 'development',
    DATABASE_URL: db.url,
    SESSION_SECRET:
      process.env.SESSION_SECRET ?? ensureSecret(join(root, '.data', 'session-secret')),
    HEATPATH_DEMO: process.env.HEATPATH_DEMO ?? 'true',
    UPLOAD_DIR: process.env.UPLOAD_DIR ?? join(root, '.data', 'uploads'),
  };
  const api = join(root, 'apps', 'api');
  await mustRun(
    process.execPath,
    ['--import', 'tsx', 'src/db/cli.ts', 'migrate'],
    'Migrating failed.',
    { cwd: api, env },
  );
  await mustRun(
    process.execPath,
    ['--import', 'tsx', 'src/db/cli.ts', 'seed-demo'],
    'Seeding failed.',
    { cwd: api, env },
  );
  // The same local mail fake as npm start, unless SMTP_HOST names a real server.
  const mailFake = process.env.SMTP_HOST
    ? []
    : [
        spawn(process.execPath, ['--import', 'tsx', 'src/dev/smtp-fake.ts'], {
          cwd: api,
          env: {
            ...env,
            SMTP_FAKE_PORT: process.env.SMTP_PORT ?? '2525',
            SMTP_FAKE_DIR: join(root, '.data', 'mail'),
          },
          stdio: 'inherit',
        }),
      ];
  const children = [
    ...mailFake,
    spawn(pnpm[0], [...pnpm[1], 'exec', 'tsx', 'watch', 'src/server.ts'], {
      cwd: api,
      env,
      stdio: 'inherit',
    }),
    spawn(pnpm[0], [...pnpm[1], 'exec', 'vite', '--host', '127.0.0.1'], {
      cwd: join(root, 'apps', 'web'),
      env,
      stdio: 'inherit',
    }),
  ];
  ok(
    'API on http://127.0.0.1:' + (process.env.PORT ?? 3000) + ', web app on http://127.0.0.1:5173',
  );
  const stop = () => {
    for (const c of children) c.kill('SIGTERM');
    db.stop();
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch(fail);
