// `npm run bench:walk`: tap → next step painted on the case page, in real chromium, for this
// checkout's web app and for a baseline build of a git ref in the same run (HEATPATH_BENCH_BASELINE_REF,
// default 0fcc839, the walk before it became local-first). The baseline's sources are taken with
// `git archive` into .data/bench-walk-baseline, installed with the pinned pnpm from the local store
// and only its web app built (into a private directory under the system's temporary directory,
// with the uploads). Both builds are served by this checkout's API against ONE fresh
// cluster (.data/bench-walk-pg-<port>, PGPORT_BENCH_WALK, 54382), migrated and seeded with the demo:
// this build on BENCH_WALK_PORT (3482), the baseline on the next port (3483). Then
// tests/e2e/bench/walk.bench.ts walks both and prints the figures. Everything is removed at the end.
// HEATPATH_BENCH_CURRENT_REF, when set, builds "this build" from that ref the same way instead of
// the working tree (to try the benchmark itself on two known builds).
import { spawn } from 'node:child_process';
import { existsSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { ensureChromium, installDependencies } from './lib/install.mjs';
import { BootstrapError, fail, ok, step } from './lib/log.mjs';
import { portIsFree, startCluster } from './lib/postgres.mjs';
import { capture, mustRun, root, runPnpm } from './lib/run.mjs';

const data = join(root, '.data');

/** The full commit a ref names, or a setup error saying so. */
function commitOf(ref) {
  const found = capture('git', ['rev-parse', '--verify', '--quiet', `${ref}^{commit}`]);
  if (found.status !== 0) {
    throw new BootstrapError(`"${ref}" names no commit here: set HEATPATH_BENCH_*_REF to one.`);
  }
  return found.stdout.trim();
}

/** The sources of `commit` in `dir` (no .git), installed, and their web app built into `outDir`. */
async function buildRef(commit, dir, outDir) {
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  step(`Unpacking ${commit.slice(0, 10)} into ${dir}…`);
  const tar = join(data, `bench-walk-${commit.slice(0, 10)}.tar`);
  await mustRun('git', ['archive', '--format=tar', '-o', tar, commit], 'git archive failed.');
  try {
    await mustRun('tar', ['-xf', tar, '-C', dir], 'Unpacking the baseline failed.');
  } finally {
    rmSync(tar, { force: true });
  }
  step(`Installing ${commit.slice(0, 10)}'s web app from the local store…`);
  await runPnpm(
    [
      'install',
      '--frozen-lockfile',
      '--prefer-offline',
      '--filter',
      '@heatpath/web...',
      '--reporter=silent',
    ],
    `Installing ${commit.slice(0, 10)} failed: its lockfile needs packages the store lacks and the registry did not give.`,
    { cwd: dir, env: { ...process.env, CI: 'true' } },
  );
  await buildWeb(dir, outDir, commit.slice(0, 10));
}

async function buildWeb(checkout, outDir, name) {
  step(`Building the web app of ${name}…`);
  await runPnpm(
    [
      '--filter',
      '@heatpath/web',
      'build',
      '--logLevel',
      'warn',
      '--outDir',
      outDir,
      '--emptyOutDir',
      // A CPU profile (BENCH_WALK_PROFILE) is read by function name: keep the names.
      ...(process.env.BENCH_WALK_PROFILE ? ['--minify', 'false'] : []),
    ],
    `Building the web app of ${name} failed; see above.`,
    { cwd: checkout },
  );
  if (!existsSync(join(outDir, 'index.html'))) {
    throw new BootstrapError(`The web build of ${name} wrote no index.html in ${outDir}.`);
  }
}

async function waitUntilUp(baseUrl) {
  const deadline = Date.now() + 60_000;
  for (;;) {
    try {
      if ((await fetch(`${baseUrl}/api/health`)).ok) return;
    } catch {
      /* not up yet */
    }
    if (Date.now() > deadline) throw new BootstrapError(`${baseUrl} did not come up in 60 s.`);
    await new Promise((resolve) => setTimeout(resolve, 250));
  }
}

async function main() {
  const pgPort = Number(process.env.PGPORT_BENCH_WALK ?? 54382);
  const port = Number(process.env.BENCH_WALK_PORT ?? 3482);
  const baselinePort = port + 1;
  for (const p of [port, baselinePort]) {
    if (!(await portIsFree(p))) {
      throw new BootstrapError(`Port ${p} is taken: free it or set BENCH_WALK_PORT.`);
    }
  }
  const baselineRef = process.env.HEATPATH_BENCH_BASELINE_REF || '0fcc839';
  const currentRef = process.env.HEATPATH_BENCH_CURRENT_REF || '';
  const baselineCommit = commitOf(baselineRef);
  const currentCommit = currentRef ? commitOf(currentRef) : '';

  await installDependencies();
  const chromium = await ensureChromium();
  const baselineDir = join(data, 'bench-walk-baseline');
  const currentDir = join(data, 'bench-walk-current');
  // The built files and the uploads live outside .data: the server's sendFile refuses a path
  // through a dot directory (index.html would answer 404, which the API maps to 400).
  const dists = mkdtempSync(join(tmpdir(), 'heatpath-bench-walk-'));
  const baselineDist = join(dists, 'baseline');
  const currentDist = join(dists, 'current');
  const uploads = join(dists, 'uploads');
  const servers = [];
  let db;
  try {
    await buildRef(baselineCommit, baselineDir, baselineDist);
    if (currentRef) await buildRef(currentCommit, currentDir, currentDist);
    else await buildWeb(root, currentDist, 'this checkout');

    db = await startCluster({
      dataDir: join(data, `bench-walk-pg-${pgPort}`),
      port: pgPort,
      database: 'heatpath_bench_walk',
      fresh: true,
    });
    const env = {
      ...process.env,
      NODE_ENV: 'production',
      DATABASE_URL: db.url,
      SESSION_SECRET: 'heatpath-bench-walk-session-secret-0123456789',
      HEATPATH_DEMO: 'true',
      // Plain http on loopback, like npm start: no Secure cookies, no HSTS.
      COOKIE_SECURE: 'false',
      LOG_LEVEL: 'warn',
      UPLOAD_DIR: uploads,
      MAIL_WORKER: 'false',
    };
    const api = join(root, 'apps', 'api');
    const cli = ['--import', 'tsx', 'src/db/cli.ts'];
    await mustRun(process.execPath, [...cli, 'migrate'], 'Migrating failed.', { cwd: api, env });
    await mustRun(process.execPath, [...cli, 'seed-demo'], 'Seeding failed.', { cwd: api, env });

    // One API (this checkout's) and one database; each build's files served by its own process.
    const builds = [
      { label: `baseline ${baselineRef}`, port: baselinePort, dist: baselineDist },
      { label: currentRef ? `current ${currentRef}` : 'this build', port, dist: currentDist },
    ];
    for (const build of builds) {
      step(`Serving ${build.label} on 127.0.0.1:${build.port}…`);
      servers.push(
        spawn(process.execPath, ['--import', 'tsx', 'src/server.ts'], {
          cwd: api,
          env: {
            ...env,
            PORT: String(build.port),
            PUBLIC_URL: `http://127.0.0.1:${build.port}`,
            WEB_DIST: build.dist,
          },
          stdio: ['ignore', 'ignore', 'inherit'],
        }),
      );
    }
    const urls = builds.map((build) => `http://127.0.0.1:${build.port}`);
    await Promise.all(urls.map(waitUntilUp));
    ok('Both builds are up against one database.');

    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'bench/walk.bench.ts'],
      'The benchmark could not be set up; see above.',
      {
        cwd: join(root, 'tests', 'e2e'),
        env: {
          ...process.env,
          CHROMIUM_PATH: chromium,
          BENCH_WALK_BUILDS: JSON.stringify(
            builds.map((build, i) => ({ label: build.label, url: urls[i] })),
          ),
        },
      },
    );
  } finally {
    for (const server of servers) server.kill('SIGTERM');
    if (db) {
      db.stop();
      db.remove();
    }
    for (const dir of [baselineDir, currentDir, dists, uploads]) {
      rmSync(dir, { recursive: true, force: true });
    }
  }
}

main().catch(fail);
