// `npm run test:stress`: `npm test` three times in a row while two busy loops keep two cores
// occupied, as on a machine that is doing other work. Prints each run's time and summary line;
// non-zero when any run failed. PGPORT_TEST, E2E_PORT and the other `npm test` settings are passed
// on; HEATPATH_STRESS_RUNS and HEATPATH_STRESS_LOOPS change the 3 runs and 2 loops.
import { spawn } from 'node:child_process';
import { loadavg } from 'node:os';
import { fail, ok, step, warn } from './lib/log.mjs';
import { root } from './lib/run.mjs';

const runs = Number(process.env.HEATPATH_STRESS_RUNS ?? 3);
const loopCount = Number(process.env.HEATPATH_STRESS_LOOPS ?? 2);
const loops = [];
let current = null;

function stopLoops() {
  for (const loop of loops) if (loop.exitCode === null && loop.signalCode === null) loop.kill();
}
process.once('exit', stopLoops);
// Stopped by hand: the loops go, and so does the test run in progress (its whole process group,
// so its cluster, server and browser stop with it).
for (const signal of ['SIGINT', 'SIGTERM'])
  process.once(signal, () => {
    stopLoops();
    if (current?.exitCode === null) {
      try {
        process.kill(-current.pid, 'SIGTERM');
      } catch {
        /* already gone */
      }
    }
    process.exit(1);
  });

/** One `npm test`, its output passed through; resolves with its exit code and summary line. */
function testRun() {
  return new Promise((resolve, reject) => {
    const child = spawn('npm', ['test'], {
      cwd: root,
      stdio: ['ignore', 'pipe', 'inherit'],
      detached: true,
    });
    current = child;
    let tail = '';
    child.stdout.on('data', (chunk) => {
      process.stdout.write(chunk);
      tail = (tail + chunk.toString()).slice(-4000);
    });
    child.on('error', reject);
    child.on('exit', (code, signal) => {
      const summary = /^Summary: .*$/m.exec(tail)?.[0] ?? 'Summary: (none printed)';
      resolve({ code: code ?? (signal ? 1 : 0), summary });
    });
  });
}

async function main() {
  step(`Starting ${loopCount} busy loops beside the test runs…`);
  for (let i = 0; i < loopCount; i += 1)
    loops.push(spawn(process.execPath, ['-e', 'for(;;){}'], { stdio: 'ignore' }));
  const results = [];
  for (let i = 1; i <= runs; i += 1) {
    step(`Stress run ${i} of ${runs}: npm test…`);
    const t = Date.now();
    const { code, summary } = await testRun();
    const seconds = (Date.now() - t) / 1000;
    const load = loadavg()[0].toFixed(2);
    results.push({ i, code, summary, seconds, load });
    (code === 0 ? ok : warn)(`Stress run ${i}: ${seconds.toFixed(0)} s, ${summary} (load ${load})`);
  }
  stopLoops();
  console.log(`\nnpm test under ${loopCount} busy loops, ${runs} runs:`);
  for (const r of results)
    console.log(
      `  run ${r.i}: ${r.seconds.toFixed(0).padStart(5)} s  ${r.summary}  (exit ${r.code}, 1-min load ${r.load})`,
    );
  const failed = results.filter((r) => r.code !== 0).length;
  console.log(failed ? `${failed} of ${runs} runs failed.` : `All ${runs} runs passed.`);
  process.exit(failed ? 1 : 0);
}

main().catch(fail);
