// Keeps the Heatpath server running under `npm start`: when it exits without being asked to
// (a crash, an out-of-memory kill), it is started again after a pause that doubles each time
// (1 s, 2 s, 4 s … up to 30 s), while the database and the mail fake stay up. A run that lasted
// a minute counts as healthy and resets the pause; after 8 crashes in a row it gives up rather
// than loop forever on a fault a restart cannot fix. Timers and the clock are injected so the
// policy is tested without waiting.

/**
 * @typedef {{ once(event: 'exit', listener: (code: number | null, signal: string | null) => void): unknown, kill(signal?: string): unknown }} ChildLike
 * @param {{
 *   start: () => ChildLike,
 *   onCrash: (info: { code: number | null, signal: string | null, delayMs: number, attempt: number, maxRestarts: number }) => void,
 *   onRestart?: (child: ChildLike, attempt: number) => void,
 *   onGiveUp: (info: { code: number | null, signal: string | null, crashes: number }) => void,
 *   onStopped: (code: number | null) => void,
 *   baseDelayMs?: number, maxDelayMs?: number, stableMs?: number, maxRestarts?: number,
 *   now?: () => number,
 *   setTimer?: (fn: () => void, ms: number) => unknown,
 *   clearTimer?: (timer: unknown) => void,
 * }} options
 */
export function supervise(options) {
  const {
    start,
    onCrash,
    onRestart,
    onGiveUp,
    onStopped,
    baseDelayMs = 1000,
    maxDelayMs = 30_000,
    stableMs = 60_000,
    maxRestarts = 8,
    now = Date.now,
    setTimer = setTimeout,
    clearTimer = clearTimeout,
  } = options;
  let child = null;
  let stopping = false;
  let crashes = 0;
  let pending = null;

  function launch() {
    const startedAt = now();
    child = start();
    child.once('exit', (code, signal) => {
      if (stopping) return onStopped(code);
      // A run that stayed up long enough was healthy: start counting again.
      if (now() - startedAt >= stableMs) crashes = 0;
      crashes += 1;
      if (crashes > maxRestarts) return onGiveUp({ code, signal, crashes: crashes - 1 });
      const delayMs = Math.min(baseDelayMs * 2 ** (crashes - 1), maxDelayMs);
      onCrash({ code, signal, delayMs, attempt: crashes, maxRestarts });
      pending = setTimer(() => {
        pending = null;
        if (stopping) return;
        launch();
        onRestart?.(child, crashes);
      }, delayMs);
    });
  }

  launch();
  return {
    /** The server process running now (a new one after each restart). */
    current: () => child,
    /** Stop for good: the running server gets `signal`; a restart waiting to happen is cancelled. */
    stop(signal = 'SIGTERM') {
      if (stopping) return;
      stopping = true;
      if (pending !== null) {
        clearTimer(pending);
        pending = null;
        onStopped(0);
        return;
      }
      child.kill(signal);
    },
  };
}
