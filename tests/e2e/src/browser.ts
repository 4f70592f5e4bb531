// Browser tests drive Debian's chromium through playwright-core against the real stack that
// scripts/test.mjs started. Never downloads a browser.
import { mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { chromium } from 'playwright-core';
import type { Browser, BrowserContext, Page } from 'playwright-core';

export const baseUrl = process.env.E2E_BASE_URL ?? 'http://127.0.0.1:3000';
const artifacts = process.env.E2E_ARTIFACTS ?? join(process.cwd(), 'test-results', 'screenshots');

export const demoPassword = 'heatpath-demo';

export interface BrowserSession {
  browser: Browser;
  close: () => Promise<void>;
  newPage: (viewport?: {
    width: number;
    height: number;
  }) => Promise<{ page: Page; context: BrowserContext }>;
}

export async function launch(): Promise<BrowserSession> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    browser,
    async newPage(viewport = { width: 1024, height: 768 }) {
      const context = await browser.newContext({ viewport, baseURL: baseUrl });
      const page = await context.newPage();
      return { page, context };
    },
    async close() {
      // Playwright gives each launch a fresh temporary profile and removes it on close.
      await browser.close();
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(artifacts, { recursive: true });
  const path = join(artifacts, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** Fill and send the sign-in form, without waiting for the outcome. */
export async function submitSignIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('E-mail address').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** Sign in and wait until the signed-in frame shows, so a following navigation cannot cut the request short. */
export async function signIn(page: Page, email: string, password = demoPassword): Promise<void> {
  await submitSignIn(page, email, password);
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 30_000 });
}

/**
 * Sets the signed-in person's remembered units through the API (°C, bar and L unless told), so
 * a test starts from the units it expects whatever an earlier or interrupted test left. Call it
 * before the first full page load after signing in: the app reads the units as it loads.
 */
export async function startWithUnits(
  page: Page,
  units: { temperature?: 'C' | 'F'; pressure?: 'bar' | 'psi'; volume?: 'L' | 'qt' } = {},
): Promise<void> {
  const res = await page.request.patch('/api/me/preferences', {
    headers: { 'X-Heatpath-Client': 'web' },
    data: { units: { temperature: 'C', pressure: 'bar', volume: 'L', ...units } },
  });
  if (!res.ok()) throw new Error(`setting units: ${res.status()} ${await res.text()}`);
}
