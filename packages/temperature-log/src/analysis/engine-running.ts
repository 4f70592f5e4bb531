// Whether the engine was running at each reading, from the engine-speed channel. After switch-off
// the coolant stops moving and the hot block heats it for a while (heat soak): that rise is not
// the engine running hot (cooling-diagnosis.md, traps; common practice), so the episodes, the
// peak and the settled temperature leave those stretches out. Without an engine-speed channel
// every reading is taken as running, and the analysis says it cannot tell.

/** Below this the engine is taken as stopped, rpm. Idle is several hundred rpm; a stopped engine logs 0 (a little noise allowed). */
export const STOPPED_BELOW_RPM = 100;

export interface EngineRunning {
  /** One flag per reading of the log: true while the engine runs. */
  readonly atReading: readonly boolean[];
  /** Whether the log has an engine-speed channel at all. */
  readonly known: boolean;
}

/**
 * Running flags per reading. An empty engine-speed cell (loggers write channels at different
 * rates) keeps the state of the reading before it; before the first filled cell the engine is
 * taken as running.
 */
export function engineRunning(
  count: number,
  engineSpeedRpm: readonly (number | null)[] | null | undefined,
): EngineRunning {
  if (engineSpeedRpm === null || engineSpeedRpm === undefined) {
    return { atReading: new Array<boolean>(count).fill(true), known: false };
  }
  const atReading = new Array<boolean>(count);
  let running = true;
  let seen = false;
  for (let i = 0; i < count; i += 1) {
    const rpm = engineSpeedRpm[i] ?? null;
    if (rpm !== null) {
      running = rpm >= STOPPED_BELOW_RPM;
      seen = true;
    }
    atReading[i] = running;
  }
  return { atReading, known: seen };
}

/** Running flags on the evenly stepped grid: each grid point takes the reading at or before it. */
export function runningOnGrid(
  times: readonly number[],
  running: EngineRunning,
  start: number,
  step: number,
  points: number,
): Uint8Array {
  const out = new Uint8Array(points);
  let j = 0;
  for (let k = 0; k < points; k += 1) {
    const t = start + k * step;
    while (j < times.length - 1 && (times[j + 1] ?? Number.POSITIVE_INFINITY) <= t) {
      j += 1;
    }
    out[k] = running.atReading[j] === false ? 0 : 1;
  }
  return out;
}

/** The stretches where the engine is stopped, as [from, to] times of the readings. */
export function stoppedStretches(
  times: readonly number[],
  running: EngineRunning,
): { fromSeconds: number; toSeconds: number; fromIndex: number; toIndex: number }[] {
  const out: { fromSeconds: number; toSeconds: number; fromIndex: number; toIndex: number }[] = [];
  let from: number | null = null;
  for (let i = 0; i <= times.length; i += 1) {
    const stopped = i < times.length && running.atReading[i] === false;
    if (stopped && from === null) {
      from = i;
    } else if (!stopped && from !== null) {
      out.push({
        fromSeconds: times[from] ?? 0,
        toSeconds: times[i - 1] ?? 0,
        fromIndex: from,
        toIndex: i - 1,
      });
      from = null;
    }
  }
  return out;
}
