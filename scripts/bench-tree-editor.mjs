// `npm run bench:tree-editor`: the tree editor's responsiveness in real chromium against the real
// stack. A fresh cluster in .data/bench-editor-pg-<port> (PGPORT_BENCH_EDITOR, 54372), the web
// app built, migrated and seeded with the demo, the server on BENCH_EDITOR_PORT (3472), then
// tests/e2e/bench/tree-editor.bench.ts, which prints the figures. Everything is removed at the end.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { ensureChromium, installDependencies } from './lib/install.mjs';
import { BootstrapError, fail, step } from './lib/log.mjs';
import { portIsFree, startCluster } from './lib/postgres.mjs';
import { mustRun, root, runPnpm } from './lib/run.mjs';

async function main() {
  await installDependencies();
  const chromium = await ensureChromium();
  const pgPort = Number(process.env.PGPORT_BENCH_EDITOR ?? 54372);
  const port = Number(process.env.BENCH_EDITOR_PORT ?? 3472);
  if (!(await portIsFree(port))) {
    throw new BootstrapError(`Port ${port} is taken: free it or set BENCH_EDITOR_PORT.`);
  }
  const db = await startCluster({
    dataDir: join(root, '.data', `bench-editor-pg-${pgPort}`),
    port: pgPort,
    database: 'heatpath_bench_editor',
    fresh: true,
  });
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    DATABASE_URL: db.url,
    SESSION_SECRET: 'heatpath-bench-editor-session-secret-0123456789',
    HEATPATH_DEMO: 'true',
    // Plain http on loopback, like npm start: no Secure cookies, no HSTS.
    COOKIE_SECURE: 'false',
    PORT: String(port),
    LOG_LEVEL: 'warn',
    UPLOAD_DIR: join(root, '.data', 'bench-editor-uploads'),
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    MAIL_WORKER: 'false',
  };
  const api = join(root, 'apps', 'api');
  let server;
  try {
    await runPnpm(
      ['--filter', '@heatpath/web', 'build', '--logLevel', 'warn'],
      'Building the web app failed; see above.',
    );
    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'src/db/cli.ts', 'migrate'],
      'Migrating failed.',
      {
        cwd: api,
        env,
      },
    );
    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'src/db/cli.ts', 'seed-demo'],
      'Seeding failed.',
      { cwd: api, env },
    );
    step(`Starting the server on 127.0.0.1:${port}…`);
    server = spawn(process.execPath, ['--import', 'tsx', 'src/server.ts'], {
      cwd: api,
      env,
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    const baseUrl = `http://127.0.0.1:${port}`;
    const deadline = Date.now() + 30_000;
    for (;;) {
      try {
        if ((await fetch(`${baseUrl}/api/health`)).ok) break;
      } catch {
        /* not up yet */
      }
      if (Date.now() > deadline) throw new BootstrapError('The server did not come up in 30 s.');
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'bench/tree-editor.bench.ts'],
      'The benchmark failed.',
      {
        cwd: join(root, 'tests', 'e2e'),
        env: { ...process.env, E2E_BASE_URL: baseUrl, CHROMIUM_PATH: chromium },
      },
    );
  } finally {
    server?.kill('SIGTERM');
    db.stop();
    db.remove();
  }
}

main().catch(fail);
