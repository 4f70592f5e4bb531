// Dependencies: the pinned pnpm and the committed lockfile, and Debian packages when missing.
import { existsSync } from 'node:fs';
import { capture, isRoot, run, runPnpm } from './run.mjs';
import { BootstrapError, ok, step } from './log.mjs';

export async function installDependencies() {
  step('Installing dependencies (pinned pnpm, committed lockfile)…');
  await runPnpm(
    ['install', '--frozen-lockfile', '--reporter=silent'],
    'Installing dependencies failed: check the npm registry is reachable and run the command again.',
    { env: { ...process.env, CI: 'true' } },
  );
  ok('Dependencies installed.');
}

let aptUpdated = false;

/** Install Debian packages with apt-get; throws a sentence saying what to do when it cannot. */
export async function aptInstall(packages, why) {
  const sentence = `Could not install ${packages.join(' ')} (${why}): run "apt-get install -y ${packages.join(' ')}" as root, then run the command again.`;
  if (!isRoot()) throw new BootstrapError(sentence);
  if (!existsSync('/usr/bin/apt-get')) throw new BootstrapError(sentence);
  step(`Installing Debian packages: ${packages.join(', ')} (${why})…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  if (!aptUpdated) {
    await run('apt-get', ['update', '-qq'], { env, stdio: ['ignore', 'ignore', 'inherit'] });
    aptUpdated = true;
  }
  const code = await run(
    'apt-get',
    ['install', '-y', '-qq', '--no-install-recommends', ...packages],
    {
      env,
      stdio: ['ignore', 'ignore', 'inherit'],
    },
  );
  if (code !== 0) throw new BootstrapError(sentence);
  ok(`Installed ${packages.join(', ')}.`);
}

export async function ensureChromium() {
  if (existsSync('/usr/bin/chromium')) return '/usr/bin/chromium';
  await aptInstall(['chromium'], 'browser tests');
  return '/usr/bin/chromium';
}

/** The IAPWS reference library for the boiling-point checks; optional, the test skips without it. */
export async function ensureIapws() {
  const probe = () => capture('/usr/bin/python3', ['-c', 'import iapws']).status === 0;
  if (existsSync('/usr/bin/python3') && probe()) return true;
  try {
    await aptInstall(['python3-iapws'], 'reference values for the boiling-point checks');
  } catch (error) {
    console.log(`! ${error.message} The IAPWS comparison will be skipped.`);
    return false;
  }
  return probe();
}
