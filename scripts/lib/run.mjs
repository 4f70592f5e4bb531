// Child processes for the bootstrap scripts: run to completion, or keep running as a service.
import { spawn, spawnSync } from 'node:child_process';
import { BootstrapError } from './log.mjs';

export const root = new URL('../..', import.meta.url).pathname.replace(/\/$/, '');
export const pnpm = ['npx', ['-y', 'pnpm@12.4.2']];

/** Run a command, streaming its output; resolve with its exit code. */
export function run(cmd, args, options = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { cwd: root, stdio: 'inherit', ...options });
    child.on('error', reject);
    child.on('exit', (code, signal) => resolve(code ?? (signal ? 1 : 0)));
  });
}

/** Run a command and fail with `message` when it does not exit 0. */
export async function mustRun(cmd, args, message, options = {}) {
  const code = await run(cmd, args, options);
  if (code !== 0) throw new BootstrapError(message);
}

/** Run quietly and return { status, stdout, stderr }. */
export function capture(cmd, args, options = {}) {
  const result = spawnSync(cmd, args, { cwd: root, encoding: 'utf8', ...options });
  return {
    status: result.status ?? 1,
    stdout: result.stdout ?? '',
    stderr: result.stderr ?? '',
    error: result.error,
  };
}

export function runPnpm(args, message, options = {}) {
  return mustRun(pnpm[0], [...pnpm[1], ...args], message, options);
}

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;
