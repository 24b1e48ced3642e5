import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const me = (token: string) => request(t.app).get('/api/auth/me').set('Authorization', `Bearer ${token}`);
const b64 = (v: object) => Buffer.from(JSON.stringify(v)).toString('base64url');

describe('bearer tokens', () => {
  it('when the token is valid, then /api/auth/me returns the user', async () => {
    const res = await me(t.tokenFor('estimator'));
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ role: 'estimator', email: 'estimator@test.invalid' });
  });

  it('when no token is sent, then 401', async () => {
    const res = await request(t.app).get('/api/auth/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
  });

  it('when the payload was tampered with (role raised), then 401', async () => {
    const [header, , signature] = t.tokenFor('tech').split('.');
    const forged = `${header}.${b64({ sub: String(t.users.tech.id), role: 'admin', exp: Math.floor(Date.now() / 1000) + 600 })}.${signature}`;
    expect((await me(forged)).status).toBe(401);
  });

  it('when the token is signed with another secret, then 401', async () => {
    const other = jwt.sign({ role: 'admin' }, 'some-other-secret-of-enough-length', { subject: String(t.users.admin.id), algorithm: 'HS256' });
    expect((await me(other)).status).toBe(401);
  });

  it('when the token uses alg none, then 401', async () => {
    const unsigned = `${b64({ alg: 'none', typ: 'JWT' })}.${b64({ sub: String(t.users.admin.id), role: 'admin' })}.`;
    expect((await me(unsigned)).status).toBe(401);
  });

  it('when the token has expired, then 401', async () => {
    const expired = jwt.sign({ role: 'tech', exp: Math.floor(Date.now() / 1000) - 60 }, t.ctx.config.jwtSecret, {
      subject: String(t.users.tech.id),
      algorithm: 'HS256',
    });
    expect((await me(expired)).status).toBe(401);
  });

  it('when the header is not a bearer token, then 401', async () => {
    const res = await request(t.app).get('/api/auth/me').set('Authorization', `Basic ${Buffer.from('a:b').toString('base64')}`);
    expect(res.status).toBe(401);
  });
});

describe('errors and health', () => {
  it('when GET /api/health, then { status: "ok" } (contract)', async () => {
    const res = await request(t.app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok' });
  });

  it('when an API route does not exist, then a JSON 404 in the error shape', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not-found');
  });

  it('when a deep link is requested and the web app is not built, then the fallback answers (not a JSON 404)', async () => {
    const res = await request(t.app).get('/jobs/123');
    expect(res.status).toBe(503);
    expect(res.text).toMatch(/npm start/);
  });
});
