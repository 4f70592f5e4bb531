// Bad input anywhere gets a JSON error a person understands, never a stack trace or SQL.
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { clientHeaders, signedIn, testApp } from '../test/context';
import { createWorkshop, testPassword } from '../test/factories';

const app = testApp({ bodyLimit: '2kb' });

function expectCleanError(body: unknown) {
  const text = JSON.stringify(body);
  expect(text).not.toMatch(/at .*\.ts:\d+|node_modules|SELECT|INSERT|sequelize|stack/i);
}

describe('bad input', () => {
  it('malformed JSON → 400', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({
      error: { code: 'bad_request', message: 'The request body is not valid JSON.' },
    });
  });

  it('oversized body → 413', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .send({ email: 'a@b.test', password: 'x'.repeat(5000) });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });

  it('wrong types → 400 naming the field', async () => {
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .send({ email: 42, password: ['x'] });
    expect(res.status).toBe(400);
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['email', 'password']);
    expectCleanError(res.body);
  });

  it('unknown API route → 404 JSON, signed in or not', async () => {
    const anon = await supertest(app).get('/api/no-such-thing');
    expect(anon.status).toBe(401);
    const { people } = await createWorkshop();
    const agent = await signedIn(app, people.lead.email, testPassword);
    const res = await agent.get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });

  it('a failure inside the server → 500 without internals', async () => {
    // A database that is not there makes the sign-in limiter's store fail for real.
    const { createSequelize } = await import('../db/sequelize');
    const broken = createSequelize('postgres://postgres:x@127.0.0.1:1/heatpath_test', {
      poolMax: 1,
    });
    const res = await supertest(testApp({}, broken))
      .post('/api/auth/sign-in')
      .set(clientHeaders)
      .send({ email: 'a@b.test', password: 'x' });
    expect(res.status).toBe(500);
    expect(res.body.error.code).toBe('internal');
    expectCleanError(res.body);
    await broken.close();
  });
});
