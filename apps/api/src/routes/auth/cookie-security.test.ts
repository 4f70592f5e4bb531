// Secure cookies and HSTS: on by default in production, off only where the local loopback start
// (scripts/start.mjs, plain http on 127.0.0.1) turns them off. Against real PostgreSQL.
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { createApp } from '../../app';
import { loadConfig } from '../../config';
import { createLogger } from '../../lib/logger';
import { clientHeaders, testConfig, testSequelize } from '../../test/context';
import { createWorkshop, testPassword } from '../../test/factories';

const secret = 'a-production-secret-of-at-least-32-characters';

function appWith(env: Record<string, string>) {
  const config = loadConfig({ DATABASE_URL: process.env.DATABASE_URL, ...env });
  // Limits and mail as in every API test; the cookie and HSTS settings are the ones under test.
  const { signInLimits, mail } = testConfig();
  return {
    config,
    app: createApp({
      config: { ...config, signInLimits, mail },
      sequelize: testSequelize(),
      logger: createLogger('silent'),
    }),
  };
}

async function signInCookies(app: ReturnType<typeof createApp>): Promise<string[]> {
  const { people } = await createWorkshop();
  const res = await supertest(app)
    .post('/api/auth/sign-in')
    .set(clientHeaders)
    .send({ email: people.lead.email, password: testPassword });
  expect(res.status, res.text).toBe(200);
  return res.headers['set-cookie'] as unknown as string[];
}

/** The value scripts/start.mjs gives COOKIE_SECURE (plain Node, no exports to import). */
function startCommandCookieSecure(): string {
  const script = readFileSync(
    join(import.meta.dirname, '../../../../../scripts/start.mjs'),
    'utf8',
  );
  const match = /COOKIE_SECURE: process\.env\.COOKIE_SECURE \?\? '(\w+)'/.exec(script);
  if (!match?.[1]) throw new Error('scripts/start.mjs no longer sets COOKIE_SECURE');
  return match[1];
}

describe('production', () => {
  it('sends Secure cookies and HSTS without being told to', async () => {
    const { config, app } = appWith({ NODE_ENV: 'production', SESSION_SECRET: secret });
    expect(config.cookieSecure).toBe(true);
    const health = await supertest(app).get('/api/health');
    expect(health.headers['strict-transport-security']).toMatch(/max-age=\d{7,}/);
    const cookies = await signInCookies(app);
    expect(cookies.filter((c) => c.startsWith('heatpath_'))).toHaveLength(2);
    for (const cookie of cookies) expect(cookie).toMatch(/; Secure/);
  });

  it('refuses to start without a session secret', () => {
    expect(() => loadConfig({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET/);
  });
});

describe('the local loopback start', () => {
  it('turns Secure cookies and HSTS off, and nothing else does', async () => {
    expect(startCommandCookieSecure()).toBe('false');
    const { config, app } = appWith({
      NODE_ENV: 'production',
      SESSION_SECRET: secret,
      COOKIE_SECURE: startCommandCookieSecure(),
    });
    expect(config.cookieSecure).toBe(false);
    const health = await supertest(app).get('/api/health');
    expect(health.headers['strict-transport-security']).toBeUndefined();
    for (const cookie of await signInCookies(app)) expect(cookie).not.toMatch(/Secure/);
  });

  it('development and tests are plain http too', () => {
    expect(loadConfig({ NODE_ENV: 'development' }).cookieSecure).toBe(false);
    expect(loadConfig({ NODE_ENV: 'test' }).cookieSecure).toBe(false);
  });
});
