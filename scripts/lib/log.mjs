// Console output for the bootstrap scripts: short steps, and one clear sentence on failure.
const useColour = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code, text) => (useColour ? `\u001b[${code}m${text}\u001b[0m` : text);

export const step = (text) => console.log(`${paint('36', '›')} ${text}`);
export const ok = (text) => console.log(`${paint('32', '✓')} ${text}`);
export const warn = (text) => console.log(`${paint('33', '!')} ${text}`);

/** A failure the person can act on: print what to do and stop. */
export class BootstrapError extends Error {}

export function fail(error) {
  if (error instanceof BootstrapError) {
    console.error(`${paint('31', '✗')} ${error.message}`);
  } else if (error && error.code === 'ENOSPC') {
    console.error(
      `${paint('31', '✗')} The disk is full: free some space and run the command again.`,
    );
  } else {
    console.error(`${paint('31', '✗')} ${error?.stack ?? error}`);
  }
  process.exit(1);
}
