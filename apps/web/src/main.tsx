// Entry point: styles, then the app; in a production build also the service worker that keeps
// the app shell on the tablet (vite.config.ts), so the app opens with no network.
/// <reference types="vite-plugin-pwa/client" />
import { StrictMode } from 'react';
import { createRoot } from 'react-dom/client';
import { registerSW } from 'virtual:pwa-register';
import { AppProvider } from './app/provider';
import './styles/index.css';

const root = document.getElementById('root');
if (!root) throw new Error('index.html has no #root element');

createRoot(root).render(
  <StrictMode>
    <AppProvider />
  </StrictMode>,
);

// Not in development: a worker serving old chunks would hide the code being edited. A new build
// takes over at once (skipWaiting) and the page reloads into it.
if (import.meta.env.PROD) registerSW({ immediate: true });
