// GET /api/health against the real database, and against a database that is not there.
import { describe, expect, it } from 'vitest';
import supertest from 'supertest';
import { createSequelize } from '../../db/sequelize';
import { testApp } from '../../test/context';

describe('GET /api/health', () => {
  it('reports the database up', async () => {
    const res = await supertest(testApp()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', db: 'ok' });
  });

  it('reports the database down with 503', async () => {
    // A real connection attempt to a port where nothing listens.
    const unreachable = createSequelize('postgres://postgres:x@127.0.0.1:1/heatpath_test', {
      poolMax: 1,
    });
    const res = await supertest(testApp({}, unreachable)).get('/api/health');
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ status: 'degraded', db: 'down' });
    await unreachable.close();
  });
});
