// `npm test`: the start command's bootstrap against a throw-away cluster, then lint, type-check,
// unit, API-against-PostgreSQL and browser tests. Ends with the time each suite took and one
// summary line; non-zero on any failure. Plain Node, no dependencies: it runs before
// node_modules exists.
//
// On two or more cores the suites run in two lanes at once (HEATPATH_TEST_LANES=1 runs them one
// after another): lint, format check, type-check, then the API tests; beside them unit and web
// tests, then the browser tests (build, migrate, seed, serve, run). Each lane is about one core
// of work (Vitest runs one worker per run on two cores), so two lanes keep a 2-core machine busy
// without piling four heavy processes onto it. A stage's output is kept and printed in one
// block when it ends, so the lanes' logs do not interleave.
import { spawn } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, rmSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join } from 'node:path';
import { ensureChromium, ensureIapws, installDependencies } from './lib/install.mjs';
import { laneCount, runLanes } from './lib/lanes.mjs';
import { BootstrapError, fail, ok, step, warn } from './lib/log.mjs';
import { portIsFree, startCluster } from './lib/postgres.mjs';
import { pnpm, root, run } from './lib/run.mjs';

const began = Date.now();
const results = [];
const timings = [];
const resultsDir = process.env.HEATPATH_RESULTS_DIR ?? join(root, 'test-results');
const logsDir = join(resultsDir, 'logs');
const only = process.env.HEATPATH_TEST_ONLY?.split(',').map((s) => s.trim());
const wanted = (stage) => !only || only.includes(stage);
const lanes = laneCount(availableParallelism(), 2);

/**
 * Runs a command for a stage. With one lane its output streams as usual; with more it goes to
 * test-results/logs/<name>.log and is printed in one block when the command ends.
 */
async function runFor(name, cmd, args, options = {}) {
  if (lanes === 1) return run(cmd, args, options);
  mkdirSync(logsDir, { recursive: true });
  const file = join(logsDir, `${name}.log`);
  const fd = openSync(file, 'w');
  let code;
  try {
    code = await run(cmd, args, { ...options, stdio: ['ignore', fd, fd] });
  } finally {
    closeSync(fd);
  }
  const text = readFileSync(file, 'utf8').trimEnd();
  if (text) console.log(`\n── ${name} ──\n${text}\n── end of ${name} ──`);
  return code;
}

async function mustRunFor(name, cmd, args, message, options) {
  if ((await runFor(name, cmd, args, options)) !== 0) throw new BootstrapError(message);
}

/** Times a step that is not a suite of its own (building, seeding), for the table at the end. */
async function timed(name, work) {
  const t = Date.now();
  try {
    return await work();
  } finally {
    timings.push({ name, seconds: (Date.now() - t) / 1000 });
  }
}

function record(stage, counts, seconds) {
  results.push({ stage, ...counts, seconds });
  timings.push({ name: stage, seconds });
  const line = `${stage}: ${counts.passed} passed, ${counts.failed} failed${counts.skipped ? `, ${counts.skipped} skipped` : ''} (${seconds.toFixed(1)} s)`;
  (counts.failed ? warn : ok)(line);
}

async function check(stage, cmd, args, options) {
  step(`${stage}…`);
  const t = Date.now();
  const code = await runFor(stage, cmd, args, options);
  record(
    stage,
    { passed: code === 0 ? 1 : 0, failed: code === 0 ? 0 : 1, skipped: 0 },
    (Date.now() - t) / 1000,
  );
}

async function vitest(stage, projects, env = {}) {
  step(`${stage} tests…`);
  const t = Date.now();
  const report = join(resultsDir, `${stage}.json`);
  rmSync(report, { force: true });
  const args = [
    ...pnpm[1],
    'exec',
    'vitest',
    'run',
    ...projects.flatMap((p) => ['--project', p]),
    '--reporter=default',
    '--reporter=json',
    `--outputFile.json=${report}`,
    ...(process.env.HEATPATH_VITEST_ARGS ? process.env.HEATPATH_VITEST_ARGS.split(' ') : []),
  ];
  const code = await runFor(stage, pnpm[0], args, { env: { ...process.env, ...env } });
  let counts = { passed: 0, failed: code === 0 ? 0 : 1, skipped: 0 };
  if (existsSync(report)) {
    const json = JSON.parse(readFileSync(report, 'utf8'));
    counts = {
      passed: json.numPassedTests,
      failed: json.numFailedTests + (code !== 0 && json.numFailedTests === 0 ? 1 : 0),
      skipped: json.numPendingTests + json.numTodoTests,
    };
    if (json.numTotalTests === 0) counts.failed += 1;
  }
  record(stage, counts, (Date.now() - t) / 1000);
}

function freePort(start) {
  return (async () => {
    for (let p = start; p < start + 200; p += 1) if (await portIsFree(p)) return p;
    throw new BootstrapError(`No free port found near ${start}: free one or choose the port.`);
  })();
}

// A throw-away cluster in a new private directory on PGPORT_TEST, or on the first free port
// from 54339 when that is not set, so two runs on one machine never break each other. Another
// run can take the port between the check and the start: then the next free one is tried.
async function startTestCluster() {
  const fixed = process.env.PGPORT_TEST ? Number(process.env.PGPORT_TEST) : null;
  let port = fixed ?? (await freePort(54339));
  for (let attempt = 1; ; attempt += 1) {
    try {
      return await startCluster({
        dataDir: join(root, '.data', `test-pg-${port}`),
        port,
        database: 'heatpath_test',
        scratch: true,
        fast: true,
      });
    } catch (error) {
      if (fixed || attempt >= 5 || !(error instanceof BootstrapError)) throw error;
      port = await freePort(port + 1);
    }
  }
}

/** The browser tests against a real server on the e2e database, with the SMTP fake beside it. */
async function browserTests(db, chromium) {
  const e2eUrl = db.createDatabase('heatpath_e2e');
  const port = await freePort(Number(process.env.E2E_PORT ?? 3900));
  // The e2e server's mail goes to the same local SMTP fake `npm start` uses.
  const smtpPort = await freePort(port + 1000);
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    DATABASE_URL: e2eUrl,
    SESSION_SECRET: 'heatpath-e2e-session-secret-0123456789abcdef',
    HEATPATH_DEMO: 'true',
    // Plain http on loopback, like npm start: no Secure cookies, no HSTS.
    COOKIE_SECURE: 'false',
    PORT: String(port),
    LOG_LEVEL: 'warn',
    UPLOAD_DIR: join(root, '.data', 'test-uploads'),
    SMTP_HOST: '127.0.0.1',
    SMTP_PORT: String(smtpPort),
    SMTP_SECURE: 'false',
    PUBLIC_URL: `http://127.0.0.1:${port}`,
    MAIL_POLL_MS: '250',
    MAIL_RETRY_BASE_MS: '500',
  };
  const api = join(root, 'apps', 'api');
  step('Building the web app and seeding the browser-test database…');
  await timed('e2e setup', async () => {
    await mustRunFor(
      'e2e-build',
      pnpm[0],
      [...pnpm[1], '--filter', '@heatpath/web', 'build', '--logLevel', 'warn'],
      'Building the web app failed; see above.',
    );
    await mustRunFor(
      'e2e-migrate',
      process.execPath,
      ['--import', 'tsx', 'src/db/cli.ts', 'migrate'],
      'Migrating the e2e database failed.',
      { cwd: api, env },
    );
    await mustRunFor(
      'e2e-seed',
      process.execPath,
      ['--import', 'tsx', 'src/db/cli.ts', 'seed-demo'],
      'Seeding the e2e database failed.',
      { cwd: api, env },
    );
  });
  const mailFake = spawn(process.execPath, ['--import', 'tsx', 'src/dev/smtp-fake.ts'], {
    cwd: api,
    env: { ...env, SMTP_FAKE_PORT: String(smtpPort), SMTP_FAKE_DIR: join(resultsDir, 'mail') },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const server = spawn(process.execPath, ['--import', 'tsx', 'src/server.ts'], {
    cwd: api,
    env,
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  try {
    const baseUrl = `http://127.0.0.1:${port}`;
    // Waits for the server to answer, not for a time: a loaded machine only makes it later.
    const deadline = Date.now() + 120_000;
    for (;;) {
      try {
        if ((await fetch(`${baseUrl}/api/health`)).ok) break;
      } catch {
        /* not up yet */
      }
      if (Date.now() > deadline || server.exitCode !== null)
        throw new BootstrapError('The browser-test server did not start; see above.');
      await new Promise((r) => setTimeout(r, 200));
    }
    await vitest('e2e', ['e2e'], {
      E2E_BASE_URL: baseUrl,
      CHROMIUM_PATH: chromium,
      E2E_ARTIFACTS: join(resultsDir, 'screenshots'),
      E2E_MAIL_DIR: join(resultsDir, 'mail'),
    });
  } finally {
    server.kill('SIGTERM');
    mailFake.kill('SIGTERM');
  }
}

async function main() {
  mkdirSync(resultsDir, { recursive: true });
  await installDependencies();
  const chromium = wanted('e2e') ? await ensureChromium() : null;
  if (wanted('unit')) await ensureIapws();

  const db = await startTestCluster();
  process.once('exit', () => {
    db.stop();
    db.remove();
  });

  const lintLane = [
    async () => {
      if (!wanted('lint')) return;
      await check('lint', pnpm[0], [...pnpm[1], 'exec', 'eslint', '.', '--max-warnings', '0']);
      await check('format', pnpm[0], [
        ...pnpm[1],
        'exec',
        'prettier',
        '--check',
        '--log-level',
        'warn',
        '.',
      ]);
    },
    async () => {
      if (wanted('typecheck')) await check('typecheck', pnpm[0], [...pnpm[1], 'exec', 'tsc', '-b']);
    },
    async () => {
      if (wanted('api')) await vitest('api', ['api'], { DATABASE_URL: db.url, NODE_ENV: 'test' });
    },
  ];
  const testLane = [
    async () => {
      if (wanted('unit')) await vitest('unit', ['unit', 'web']);
    },
    async () => {
      if (wanted('e2e')) await browserTests(db, chromium);
    },
  ];
  step(
    lanes > 1
      ? `Running the suites in ${lanes} lanes (lint, format, type-check, API | unit and web, browser)…`
      : 'Running the suites one after another…',
  );
  await runLanes([lintLane, testLane], lanes);

  const total = results.reduce(
    (a, r) => ({
      passed: a.passed + r.passed,
      failed: a.failed + r.failed,
      skipped: a.skipped + r.skipped,
    }),
    { passed: 0, failed: 0, skipped: 0 },
  );
  console.log(
    `\nHeatpath test run took ${((Date.now() - began) / 1000).toFixed(0)} s` +
      ` (${lanes} lane${lanes > 1 ? 's' : ''} on ${availableParallelism()} cores).`,
  );
  for (const r of results)
    console.log(
      `  ${r.stage.padEnd(10)} ${r.passed} passed, ${r.failed} failed${r.skipped ? `, ${r.skipped} skipped` : ''}`,
    );
  console.log('Time per suite:');
  for (const t of timings)
    console.log(`  ${t.name.padEnd(10)} ${t.seconds.toFixed(1).padStart(6)} s`);
  console.log(
    `Summary: ${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ''}`,
  );
  process.exit(total.failed ? 1 : 0);
}

main().catch(fail);
