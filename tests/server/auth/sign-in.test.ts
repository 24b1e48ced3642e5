import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../../server/users/user.entity';
import { createTestApp, TEST_PASSWORD, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const signIn = (email: string, password: string) => request(t.app).post('/api/auth/sign-in').send({ email, password });

describe('POST /api/auth/sign-in', () => {
  it('when the password is right, then it returns a token and the public user (contract shape)', async () => {
    const res = await signIn('tech@test.invalid', TEST_PASSWORD);
    expect(res.status).toBe(200);
    expect(Object.keys(res.body).sort()).toEqual(['token', 'user']);
    expect(res.body.user).toMatchObject({ id: t.users.tech.id, email: 'tech@test.invalid', name: 'Test tech', role: 'tech' });
    expect(res.body.user.passwordHash).toBeUndefined();
    const decoded = jwt.decode(res.body.token, { complete: true });
    expect(decoded?.header.alg).toBe('HS256');
    const payload = decoded?.payload as jwt.JwtPayload;
    expect(payload.sub).toBe(String(t.users.tech.id));
    expect(payload.role).toBe('tech');
    expect((payload.exp ?? 0) - (payload.iat ?? 0)).toBe(12 * 3600);
  });

  it('when the e-mail differs only in case and spaces, then it still signs in', async () => {
    const res = await signIn('  Tech@Test.Invalid ', TEST_PASSWORD);
    expect(res.status).toBe(200);
  });

  it('when the password is wrong or the user unknown, then both are 401 with the same message', async () => {
    const wrong = await signIn('tech@test.invalid', 'not-the-password');
    const unknown = await signIn('nobody@test.invalid', 'whatever-password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body.error.message).toBe(unknown.body.error.message);
    expect(wrong.body.error.code).toBe(unknown.body.error.code);
  });

  it('when the user is deactivated, then sign-in is refused and their old token stops working', async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    const user = await repo.save(repo.create({ ...t.users.tech, id: undefined, email: 'gone@test.invalid', active: true }));
    const ok = await signIn('gone@test.invalid', TEST_PASSWORD);
    expect(ok.status).toBe(200);
    await repo.update({ id: user.id }, { active: false });
    const refused = await signIn('gone@test.invalid', TEST_PASSWORD);
    expect(refused.status).toBe(401);
    expect(refused.body.error.code).toBe('account-inactive');
    const me = await request(t.app).get('/api/auth/me').set('Authorization', `Bearer ${ok.body.token}`);
    expect(me.status).toBe(401);
  });

  it('when the body is not an e-mail and password, then 422 names the fields', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').send({ email: 'not-an-email' });
    expect(res.status).toBe(422);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['email', 'password']));
  });

  it('when the JSON is malformed, then 400 in the error shape with no stack trace', async () => {
    const res = await request(t.app).post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body).toEqual({ error: { code: 'bad-json', message: expect.any(String) } });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js):\d+/);
  });
});

describe('sign-in rate limit', () => {
  it('when one e-mail is tried more than the limit, then the next attempt is 429', async () => {
    const limited = await createTestApp({ signInLimit: 3 });
    try {
      const attempt = () => request(limited.app).post('/api/auth/sign-in').send({ email: 'tech@test.invalid', password: 'wrong-password' });
      for (let i = 0; i < 3; i++) expect((await attempt()).status).toBe(401);
      const res = await attempt();
      expect(res.status).toBe(429);
      expect(res.body.error.code).toBe('too-many-attempts');
    } finally {
      await limited.close();
    }
  });
});
