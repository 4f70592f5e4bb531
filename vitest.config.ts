// One Vitest run, three projects: pure packages, the web app (jsdom), and the API against
// the real PostgreSQL that scripts/test.mjs starts. `vitest run --project NAME` picks one.
import { defineConfig } from 'vitest/config';

export default defineConfig({
  test: {
    projects: [
      {
        test: {
          name: 'unit',
          // The start and test commands' own logic (plain Node) is checked here too.
          include: ['packages/*/src/**/*.test.ts', 'scripts/**/*.test.mjs'],
          environment: 'node',
          // Property tests run a fixed number of cases; on a loaded machine that takes longer.
          testTimeout: 30_000,
        },
      },
      {
        extends: './apps/web/vite.config.ts',
        test: {
          name: 'web',
          root: './apps/web',
          include: ['src/**/*.test.{ts,tsx}'],
          environment: 'jsdom',
          setupFiles: ['./src/test/setup.ts'],
          // Tests wait for what they expect to see (findBy*/waitFor, 10 s each, src/test/setup.ts);
          // a whole screen rendered in jsdom on a loaded 2-core machine needs far more than 5 s.
          // One timeout for all: no test file sets a shorter one of its own.
          testTimeout: 60_000,
        },
      },
      {
        test: {
          name: 'api',
          include: ['apps/api/src/**/*.test.ts'],
          environment: 'node',
          globalSetup: ['./apps/api/src/test/global-setup.ts'],
          testTimeout: 20_000,
          hookTimeout: 30_000,
        },
      },
      {
        test: {
          name: 'e2e',
          include: ['tests/e2e/src/**/*.test.ts'],
          environment: 'node',
          fileParallelism: false,
          // A browser test walks a whole case (20+ steps); every step waits for what it expects
          // to see. The timeout is only the last resort, sized for a heavily loaded 2-core machine.
          testTimeout: 300_000,
          hookTimeout: 120_000,
        },
      },
    ],
  },
});
