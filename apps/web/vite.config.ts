// Vite config for the web app; the root vitest.config.ts extends it for the 'web' project, so
// tests compile JSX and Tailwind exactly as the build does. The service worker (vite-plugin-pwa)
// is left out of test runs: jsdom has no service workers and tests import no entry point.
import { execSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { defineConfig } from 'vite';
import react from '@vitejs/plugin-react';
import tailwindcss from '@tailwindcss/vite';
import { VitePWA } from 'vite-plugin-pwa';

/** Names this build: the persisted query cache of another build is dropped, never misread. */
function buildId(): string {
  if (process.env.HEATPATH_BUILD_ID) return process.env.HEATPATH_BUILD_ID;
  const { version } = JSON.parse(
    readFileSync(new URL('./package.json', import.meta.url), 'utf8'),
  ) as { version: string };
  if (process.env.VITEST) return `${version}-test`;
  try {
    const commit = execSync('git rev-parse --short HEAD', { stdio: ['ignore', 'pipe', 'ignore'] });
    return `${version}-${commit.toString().trim()}`;
  } catch {
    return version;
  }
}

// The app shell works with no network: the service worker precaches the built HTML, JS and CSS
// chunks, the icons and the Latin fonts, and answers every navigation with index.html. It never
// touches /api: the API's data is kept by the persisted query cache (src/lib/persist-cache.ts) and
// the answers given offline by the outbox, and attachments are `no-store`.
const pwa = VitePWA({
  strategies: 'generateSW',
  registerType: 'autoUpdate',
  // Registered by src/main.tsx, in production builds only.
  injectRegister: false,
  includeAssets: ['favicon.svg', 'apple-touch-icon.png'],
  manifest: {
    id: '/',
    name: 'Heatpath — cooling-system diagnosis',
    short_name: 'Heatpath',
    description: 'Guided cooling-system diagnosis for independent workshops.',
    lang: 'en',
    start_url: '/',
    scope: '/',
    display: 'standalone',
    // The app's own tokens (src/styles/index.css): primary and canvas.
    theme_color: '#0b5a51',
    background_color: '#f3f1ea',
    icons: [
      { src: '/favicon.svg', sizes: 'any', type: 'image/svg+xml', purpose: 'any' },
      { src: '/pwa-192.png', sizes: '192x192', type: 'image/png', purpose: 'any' },
      { src: '/pwa-512.png', sizes: '512x512', type: 'image/png', purpose: 'any' },
      { src: '/maskable-512.png', sizes: '512x512', type: 'image/png', purpose: 'maskable' },
    ],
  },
  workbox: {
    // Every script and style chunk (the icons and the manifest are added by the plugin); of the
    // font files only the Latin subsets in woff2, which every supported browser reads (the other
    // subsets still load online when a page needs them).
    globPatterns: ['**/*.{html,js,css}', 'assets/ibm-plex-sans-latin-*.woff2'],
    navigateFallback: '/index.html',
    navigateFallbackDenylist: [/^\/api(\/|$)/],
    // No runtimeCaching: a request the precache does not hold goes to the network untouched.
    cleanupOutdatedCaches: true,
    skipWaiting: true,
    clientsClaim: true,
  },
});

export default defineConfig({
  plugins: [react(), tailwindcss(), ...(process.env.VITEST ? [] : [pwa])],
  define: {
    'import.meta.env.HEATPATH_BUILD_ID': JSON.stringify(buildId()),
  },
  build: {
    outDir: 'dist',
    // The initial page and the calculator chunk are measured in gzip in docs/design.md; keep the
    // report so a regression in weight is visible in every build log.
    reportCompressedSize: true,
    // The entry chunk is ~520 KB raw / ~160 KB gzip by design (React, Router, Query, zod); what
    // matters is gzip and keeping mathjs out of it, both tracked in docs/design.md.
    chunkSizeWarningLimit: 600,
  },
  server: {
    // In development the API runs as its own process; the browser still sees one origin, so the
    // session cookie and the same-origin request guard behave as in production.
    proxy: { '/api': 'http://127.0.0.1:3000' },
  },
});
