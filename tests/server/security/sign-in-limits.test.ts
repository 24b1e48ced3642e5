import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { loadConfig, parseTrustProxy } from '../../../server/env';
import { createTestApp, TEST_PASSWORD, type TestApp } from '../../helpers/test-app';

// Sign-in limits that do not lock out the real user (Issue 8 item 7). A limit of 3 keeps the tests
// short; the shipped default is TANDEM_SIGNIN_LIMIT=10 (README).
const LIMIT = 3;
const EMAIL = 'tech@test.invalid';

let t: TestApp | undefined;
afterEach(async () => {
  await t?.close();
  t = undefined;
});

async function appWith(trustProxy?: false | number | string[]) {
  t = await createTestApp({ signInLimit: LIMIT, trustProxy });
  return t;
}

/** A sign-in from a client address (only believed when a proxy is configured). */
const signIn = (app: TestApp, password: string, from?: string, email = EMAIL) => {
  const req = request(app.app).post('/api/auth/sign-in');
  if (from) req.set('X-Forwarded-For', from);
  return req.send({ email, password });
};

describe('sign-in limits', () => {
  it('when the right password is used many times over the limit, then every sign-in succeeds', async () => {
    const app = await appWith();
    for (let i = 0; i < LIMIT * 4; i++) expect((await signIn(app, TEST_PASSWORD)).status).toBe(200);
  });

  it('when an account fails the limit from one address, then the next try from there is 429 even with the right password', async () => {
    const app = await appWith();
    for (let i = 0; i < LIMIT; i++) expect((await signIn(app, 'wrong-password')).status).toBe(401);
    const res = await signIn(app, TEST_PASSWORD);
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('too-many-attempts');
  });

  it('when failures and successes mix, then only the failures count', async () => {
    const app = await appWith();
    for (let i = 0; i < LIMIT - 1; i++) {
      expect((await signIn(app, 'wrong-password')).status).toBe(401);
      expect((await signIn(app, TEST_PASSWORD)).status).toBe(200);
    }
    // Had the successes counted, this would already be refused; it is the LIMIT-th failure.
    expect((await signIn(app, 'wrong-password')).status).toBe(401);
    expect((await signIn(app, TEST_PASSWORD)).status).toBe(429);
  });

  it("when an attacker elsewhere exhausts the account's failures, then the real user at their own address still signs in", async () => {
    const app = await appWith(['loopback']);
    for (let i = 0; i < LIMIT; i++) expect((await signIn(app, 'guess', '203.0.113.7')).status).toBe(401);
    expect((await signIn(app, 'guess', '203.0.113.7')).status).toBe(429);
    expect((await signIn(app, TEST_PASSWORD, '198.51.100.20')).status).toBe(200);
  });

  it('when one address guesses across many accounts, then its address limit (3× the account limit) stops it', async () => {
    const app = await appWith(['loopback']);
    for (let i = 0; i < LIMIT * 3; i++) expect((await signIn(app, 'guess', '203.0.113.8', `nobody.${i}@test.invalid`)).status).toBe(401);
    expect((await signIn(app, 'guess', '203.0.113.8', 'someone.else@test.invalid')).status).toBe(429);
    expect((await signIn(app, TEST_PASSWORD, '198.51.100.21')).status).toBe(200);
  });

  it('when no proxy is configured, then X-Forwarded-For is ignored and a new header does not reset the count', async () => {
    const app = await appWith();
    for (let i = 0; i < LIMIT; i++) expect((await signIn(app, 'guess', `203.0.113.${i + 1}`)).status).toBe(401);
    expect((await signIn(app, 'guess', '203.0.113.99')).status).toBe(429);
  });

  it('when a proxy is trusted by hop count, then the address it reports keys the limit', async () => {
    const app = await appWith(1);
    for (let i = 0; i < LIMIT; i++) expect((await signIn(app, 'guess', '203.0.113.50')).status).toBe(401);
    expect((await signIn(app, TEST_PASSWORD, '198.51.100.50')).status).toBe(200);
  });
});

describe('wrong current passwords on POST /api/auth/password', () => {
  const change = (app: TestApp, currentPassword: string, newPassword = 'a-new-password-77') =>
    request(app.app)
      .post('/api/auth/password')
      .set('Authorization', `Bearer ${app.tokenFor('tech')}`)
      .send({ currentPassword, newPassword });

  it('when the current password is wrong the limit of times, then the next change is 429 even with the right one', async () => {
    const app = await appWith();
    for (let i = 0; i < LIMIT; i++) expect((await change(app, 'not-it')).status).toBe(422);
    const res = await change(app, TEST_PASSWORD);
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('too-many-attempts');
  });

  it('when changes succeed, then they do not count', async () => {
    const app = await appWith();
    let current = TEST_PASSWORD;
    for (let i = 0; i < LIMIT + 1; i++) {
      const next = `changed-password-${i}x`;
      expect((await change(app, current, next)).status).toBe(200);
      current = next;
    }
  });
});

describe('TANDEM_TRUST_PROXY', () => {
  it.each([
    ['false', false],
    ['', false],
    ['0', false],
    ['2', 2],
    ['loopback', ['loopback']],
    ['10.0.0.0/8, 192.168.1.1', ['10.0.0.0/8', '192.168.1.1']],
    ['fd00::/8,uniquelocal', ['fd00::/8', 'uniquelocal']],
  ] as const)('when set to "%s", then it reads as %j', (raw, expected) => {
    expect(parseTrustProxy(raw)).toEqual(expected);
  });

  it.each(['true', 'everything', '10.0.0.0/33', '300.1.1.1', '10.0.0.1/8/2'])(
    'when set to "%s", then the server refuses to start',
    (raw) => {
      expect(() => parseTrustProxy(raw)).toThrow(/TANDEM_TRUST_PROXY/);
    },
  );

  it('when it is not set, then no proxy is trusted', () => {
    expect(loadConfig({ TANDEM_JWT_SECRET: 'a-secret-of-enough-length', TANDEM_DATA_DIR: '/tmp' }).trustProxy).toBe(false);
  });
});
