// Gives other work a turn between pieces of a long log, so a 100,000-row upload does not hold
// the server's event loop. setImmediate (Node) runs after pending I/O without the 1–4 ms clamp
// of setTimeout; browsers fall back to setTimeout.

type Scheduler = (callback: () => void) => unknown;

const immediate = (globalThis as { setImmediate?: Scheduler }).setImmediate;

export function yieldToEventLoop(): Promise<void> {
  return new Promise((resolve) => {
    if (immediate !== undefined) {
      immediate(resolve);
    } else {
      setTimeout(resolve, 0);
    }
  });
}
