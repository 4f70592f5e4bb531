// `npm start`: install, start the private PostgreSQL, migrate, seed the demo on an empty
// database, build the web app, start a local SMTP fake (unless SMTP_HOST names a real server)
// and serve Heatpath from one Node process, restarted if it crashes while the database and the
// mail fake stay up. Plain Node, no dependencies: it runs before node_modules exists.
import { spawn } from 'node:child_process';
import { join } from 'node:path';
import { ensureSecret, portIsFree, startCluster } from './lib/postgres.mjs';
import { installDependencies } from './lib/install.mjs';
import { fail, ok, step, warn, BootstrapError } from './lib/log.mjs';
import { root, runPnpm, mustRun } from './lib/run.mjs';
import { supervise } from './lib/supervise.mjs';

const began = Date.now();
const port = Number(process.env.PORT ?? 3000);
const pgPort = Number(process.env.PGPORT ?? 54329);
const dataRoot = join(root, '.data');

async function main() {
  if (!Number.isInteger(port) || port < 1 || port > 65535)
    throw new BootstrapError(`PORT must be a port number, got "${process.env.PORT}".`);
  if (!Number.isInteger(pgPort) || pgPort < 1 || pgPort > 65535)
    throw new BootstrapError(`PGPORT must be a port number, got "${process.env.PGPORT}".`);
  if (!(await portIsFree(port))) {
    throw new BootstrapError(
      `Port ${port} is already in use: stop the program using it or run with another port, e.g. PORT=${port + 1} npm start.`,
    );
  }
  await installDependencies();
  const db = await startCluster({
    dataDir: join(dataRoot, 'pg'),
    port: pgPort,
    database: process.env.PGDATABASE ?? 'heatpath',
  });
  const stopDb = () => db.stop();
  process.once('exit', stopDb);

  const env = {
    ...process.env,
    NODE_ENV: process.env.NODE_ENV ?? 'production',
    DATABASE_URL: db.url,
    SESSION_SECRET: process.env.SESSION_SECRET ?? ensureSecret(join(dataRoot, 'session-secret')),
    HEATPATH_DEMO: process.env.HEATPATH_DEMO ?? 'true',
    // Production mode, but plain http on loopback: a Secure cookie would never come back, and
    // HSTS would pin 127.0.0.1 to https. Behind HTTPS leave COOKIE_SECURE unset (secure).
    COOKIE_SECURE: process.env.COOKIE_SECURE ?? 'false',
    PORT: String(port),
    UPLOAD_DIR: process.env.UPLOAD_DIR ?? join(dataRoot, 'uploads'),
  };
  const api = join(root, 'apps', 'api');
  step('Migrating the database…');
  await mustRun(
    process.execPath,
    ['--import', 'tsx', 'src/db/cli.ts', 'migrate'],
    'Migrating the database failed; see the message above.',
    { cwd: api, env },
  );
  if (env.HEATPATH_DEMO === 'true') {
    await mustRun(
      process.execPath,
      ['--import', 'tsx', 'src/db/cli.ts', 'seed-demo'],
      'Seeding the demo workshop failed; see the message above.',
      { cwd: api, env },
    );
  }
  // Workshops still on an earlier shipped version of a Heatpath tree get the current one as a
  // new version; cases pinned to the old version keep it.
  await mustRun(
    process.execPath,
    ['--import', 'tsx', 'src/db/cli.ts', 'update-shipped-trees'],
    'Updating the shipped trees failed; see the message above.',
    { cwd: api, env },
  );
  step('Building the web app…');
  await runPnpm(
    ['--filter', '@heatpath/web', 'build', '--logLevel', 'warn'],
    'Building the web app failed; see the message above.',
  );

  // Mail: without SMTP_HOST, a local fake on loopback keeps every message in .data/mail.
  let mailFake = null;
  if (!process.env.SMTP_HOST) {
    const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
    if (!(await portIsFree(smtpPort)))
      throw new BootstrapError(
        `Port ${smtpPort} for the local mail fake is in use: free it or run with SMTP_PORT=${smtpPort + 1} npm start.`,
      );
    step('Starting the local mail fake…');
    mailFake = spawn(process.execPath, ['--import', 'tsx', 'src/dev/smtp-fake.ts'], {
      cwd: api,
      env: { ...env, SMTP_FAKE_PORT: String(smtpPort), SMTP_FAKE_DIR: join(dataRoot, 'mail') },
      stdio: ['ignore', 'ignore', 'inherit'],
    });
    process.once('exit', () => mailFake?.kill('SIGTERM'));
    Object.assign(env, {
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(smtpPort),
      SMTP_SECURE: 'false',
    });
  }
  env.PUBLIC_URL = process.env.PUBLIC_URL ?? `http://127.0.0.1:${port}`;

  step('Starting Heatpath…');
  const startServer = () =>
    spawn(process.execPath, ['--import', 'tsx', 'src/server.ts'], {
      cwd: api,
      env,
      stdio: ['ignore', 'pipe', 'inherit'],
    });
  let announced = false;
  let restarts = 0;
  // Each server process's log lines, and the banner the first time one is listening.
  const follow = (server) => {
    let pending = '';
    let listening = false;
    server.stdout.on('data', (chunk) => {
      pending += chunk.toString();
      const lines = pending.split('\n');
      pending = lines.pop() ?? '';
      for (const line of lines) showLogLine(line);
      if (listening || !lines.some((l) => l.includes('"msg":"listening"'))) return;
      listening = true;
      if (announced) {
        ok(`Heatpath is serving again on http://127.0.0.1:${port} (restart ${restarts}).`);
        return;
      }
      announced = true;
      const seconds = ((Date.now() - began) / 1000).toFixed(1);
      ok(`Heatpath is ready after ${seconds} s.`);
      console.log(`\n  Open  http://127.0.0.1:${port}\n`);
      if (env.HEATPATH_DEMO === 'true') {
        console.log('  Demo sign-ins (password heatpath-demo):');
        console.log('    Harbour Lane Garage  lead@harbourlane.test        workshop lead');
        console.log('                         tech@harbourlane.test        technician');
        console.log('                         apprentice@harbourlane.test  apprentice');
        console.log('                         advisor@harbourlane.test     service advisor');
        console.log('    Millbrook Autos      lead@millbrook.test          workshop lead\n');
      }
      console.log(
        mailFake
          ? `  Mail goes to a local fake on 127.0.0.1:${env.SMTP_PORT}: nothing leaves this machine.\n` +
              `  Each message is kept in ${join(dataRoot, 'mail')} (.eml files); the lead's Outbox\n` +
              '  screen shows what was sent and its status.\n'
          : `  Mail goes to ${env.SMTP_HOST}:${env.SMTP_PORT ?? 2525} (SMTP_HOST).\n`,
      );
      console.log('  Press Ctrl-C to stop the server, the mail fake and the database.\n');
    });
  };
  const stopEverything = (code) => {
    mailFake?.kill('SIGTERM');
    stopDb();
    ok(mailFake ? 'Server, mail fake and database stopped.' : 'Server and database stopped.');
    process.exit(code ?? 0);
  };
  const how = (code, signal) => (signal ? `was killed (${signal})` : `exited with code ${code}`);
  const supervisor = supervise({
    start: () => {
      const server = startServer();
      follow(server);
      return server;
    },
    // The database and the mail fake keep running: only the server is started again.
    onCrash: ({ code, signal, delayMs, attempt, maxRestarts }) =>
      warn(
        `Heatpath's server ${how(code, signal)}. The database and mail fake are still up; ` +
          `restarting the server in ${delayMs / 1000} s (attempt ${attempt} of ${maxRestarts}).`,
      ),
    onRestart: () => {
      restarts += 1;
      step(`Restarting Heatpath's server (restart ${restarts})…`);
    },
    onGiveUp: ({ code, signal, crashes }) => {
      warn(
        `Heatpath's server ${how(code, signal)} again, after ${crashes} restarts in a row. ` +
          'Giving up: see the messages above, fix the cause and run npm start again.',
      );
      stopEverything(1);
    },
    onStopped: (code) => stopEverything(code),
  });
  const shutdown = (signal) => {
    step(`Stopping (${signal})…`);
    supervisor.stop('SIGTERM');
  };
  process.on('SIGINT', () => shutdown('Ctrl-C'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

// Warnings and errors always reach the terminal; everything else only when HEATPATH_VERBOSE=true.
function showLogLine(line) {
  if (!line.trim()) return;
  let level;
  try {
    level = JSON.parse(line).level ?? 30;
  } catch {
    level = 50;
  }
  if (level >= 40 || process.env.HEATPATH_VERBOSE === 'true') console.log(line);
}

main().catch(fail);
