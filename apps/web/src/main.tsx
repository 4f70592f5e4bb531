// Entry point: styles, then the app; in a production build also the service worker that keeps
// the app shell on the tablet (vite.config.ts), so the app opens with no network.
/// <reference types="vite-plugin-pwa/client" />
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { registerSW } from 'virtual:pwa-register';
import { AppProvider } from './app/provider';
import { announceUpdate } from './lib/app-update';
import './styles/index.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProvider />
  </StrictMode>,
);

// Not in development: a worker serving old chunks would hide the code being edited. A new build
// takes over at once (skipWaiting), and the shell offers the reload; the page never reloads by
// itself. The first install is not an update: a page that no worker controlled when it loaded
// (a first visit, or a second page opened while the first install was still precaching) is
// already the newest build.
if (import.meta.env.PROD) {
  const controlledAtLoad =
    'serviceWorker' in navigator && navigator.serviceWorker.controller !== null;
  registerSW({
    immediate: true,
    onNeedReload: () => {
      if (controlledAtLoad) announceUpdate();
    },
  });
}
