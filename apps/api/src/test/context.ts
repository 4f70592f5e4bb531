// What an API test needs: the real app on the real test database, and an agent that signs in.
import supertest from 'supertest';
import type { Sequelize } from 'sequelize';
import { afterAll } from 'vitest';
import { createApp } from '../app';
import { loadConfig } from '../config';
import type { Config } from '../config';
import { initModels } from '../db/models/index';
import { createSequelize } from '../db/sequelize';
import type { Clock } from '../lib/clock';
import { createLogger } from '../lib/logger';

let shared: Sequelize | null = null;

export function testSequelize(): Sequelize {
  if (!shared) {
    const url = process.env.DATABASE_URL;
    if (!url) throw new Error('DATABASE_URL is not set: run API tests through `npm test`.');
    shared = createSequelize(url, { poolMax: 5 });
    initModels(shared);
    const s = shared;
    afterAll(async () => {
      await s.close();
      shared = null;
    });
  }
  return shared;
}

export function testConfig(overrides: Partial<Config> = {}): Config {
  const base = loadConfig({ ...process.env, NODE_ENV: 'test', LOG_LEVEL: 'silent' });
  return {
    ...base,
    signInLimits: { perAccount: 1000, perDevice: 1000, perAddress: 100_000, windowMinutes: 15 },
    ...overrides,
  };
}

export function testApp(
  overrides: Partial<Config> = {},
  sequelize: Sequelize = testSequelize(),
  clock?: Clock,
) {
  const config = testConfig(overrides);
  return createApp({ config, sequelize, logger: createLogger('silent'), clock });
}

export const clientHeaders = { 'X-Heatpath-Client': 'web' } as const;

/** A supertest agent that keeps cookies and sends Heatpath's client header. */
export function agentFor(app: ReturnType<typeof testApp>) {
  return supertest.agent(app).set(clientHeaders);
}

export async function signedIn(app: ReturnType<typeof testApp>, email: string, password: string) {
  const agent = agentFor(app);
  const res = await agent.post('/api/auth/sign-in').send({ email, password });
  if (res.status !== 200) throw new Error(`sign-in for ${email} failed: ${res.status} ${res.text}`);
  return agent;
}
