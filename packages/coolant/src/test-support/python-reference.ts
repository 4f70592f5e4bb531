// Reference libraries outside the project, reached through Debian's /usr/bin/python3 so tests can
// compare Heatpath's figures with them. When a library is missing the comparison is skipped with
// a printed message — never silently passed.
import { execFileSync } from 'node:child_process';

const PYTHON = '/usr/bin/python3';

export function pythonHas(module: string): boolean {
  try {
    execFileSync(PYTHON, ['-c', `import ${module}`], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

/** Runs `script` with JSON-encoded `input` as argv[1] and parses its printed JSON. */
export function runPython<T>(script: readonly string[], input: unknown): T {
  const out = execFileSync(PYTHON, ['-c', script.join('\n'), JSON.stringify(input)], {
    encoding: 'utf8',
  });
  return JSON.parse(out) as T;
}

export const HAVE_IAPWS = pythonHas('iapws');

export const IAPWS_SKIP_NOTE =
  'SKIPPED: the iapws Python library (Debian python3-iapws) is not importable by /usr/bin/python3; install it with `apt-get install -y python3-iapws` to run this comparison';

/** Water density (kg/m³) and cp (J/(kg·K)) from iapws's IAPWS97 at `mpa` for each °C. */
export function iapwsWater(celsius: readonly number[], mpa: number): [number, number][] {
  return runPython<[number, number][]>(
    [
      'import json, sys',
      'from iapws import IAPWS97',
      'ts, p = json.loads(sys.argv[1])',
      'print(json.dumps([[w.rho, w.cp * 1000] for w in (IAPWS97(T=t + 273.15, P=p) for t in ts)]))',
    ],
    [celsius, mpa],
  );
}
