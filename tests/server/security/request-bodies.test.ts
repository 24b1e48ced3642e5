import express from 'express';
import pino from 'pino';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/auth';
import { errorMiddleware } from '../../../server/lib/errors';
import { User } from '../../../server/users/user.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// Malformed, oversized and wrong-type request bodies are 4xx in the error shape (Issue 8 item 5),
// and a unique violation is a 409 naming the field (item 1) — mapped by error type, not by route.

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
});
afterAll(async () => {
  await t.close();
});

const as = (role: Role) => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const LEAK = /\bat .*\.(ts|js|mjs):\d+|node_modules|busboy|multer|SQLITE/i;

function expectErrorShape(res: request.Response, status: number) {
  expect(res.status).toBe(status);
  expect(res.body).toEqual({ error: expect.objectContaining({ code: expect.any(String), message: expect.any(String) }) });
  expect(JSON.stringify(res.body)).not.toMatch(LEAK);
}

describe('JSON bodies', () => {
  const signIn = () => request(t.app).post('/api/auth/sign-in');
  const cases: [name: string, status: number, send: () => request.Test][] = [
    ['invalid JSON', 400, () => signIn().set('Content-Type', 'application/json').send('{"email": ')],
    ['a JSON string where an object is expected', 400, () => signIn().set('Content-Type', 'application/json').send('"just a string"')],
    ['a body over the 1 MB limit', 413, () => signIn().send({ email: 'a@test.invalid', password: 'x'.repeat(1_100_000) })],
    ['plain text', 415, () => signIn().set('Content-Type', 'text/plain').send('email=a&password=b')],
    ['a form-encoded body', 415, () => signIn().type('form').send({ email: 'a@test.invalid', password: 'b' })],
    ['XML', 415, () => signIn().set('Content-Type', 'application/xml').send('<a/>')],
    ['JSON in a character set the server does not read', 415, () => signIn().set('Content-Type', 'application/json; charset=iso-8859-1').send('{}')],
    ['a content encoding the server does not read', 415, () => signIn().set('Content-Type', 'application/json').set('Content-Encoding', 'compress').send('{}')],
    ['form data sent to a JSON route', 415, () => signIn().field('email', 'a@test.invalid').field('password', 'b')],
    ['a JSON array', 422, () => signIn().send([1, 2])],
    ['wrong types in the fields', 422, () => signIn().send({ email: 42, password: { $ne: null } })],
    ['no body at all', 422, () => signIn()],
  ];

  it.each(cases)('when sign-in gets %s, then %i in the error shape', async (_name, status, send) => {
    expectErrorShape(await send(), status);
  });

  it.each([
    ['PUT /api/settings/rules as text', 415, () => request(t.app).put('/api/settings/rules').set(as('admin')).set('Content-Type', 'text/plain').send('x')],
    ['POST /api/users with a number for the role', 422, () => request(t.app).post('/api/users').set(as('admin')).send({ email: 'n@test.invalid', name: 'N', role: 7, password: 'long-enough-1' })],
    ['PATCH /api/users/:id with a prototype key', 422, () => request(t.app).patch(`/api/users/${t.users.tech.id}`).set(as('admin')).set('Content-Type', 'application/json').send('{"__proto__":{"role":"admin"}}')],
    ['POST /api/checks with invalid JSON', 400, () => request(t.app).post('/api/checks').set(as('tech')).set('Content-Type', 'application/json').send('{]')],
  ] as const)('when %s, then %i', async (_name, status, send) => {
    expectErrorShape(await send(), status);
  });

  it('when a body is empty with Content-Length 0 and no type, then the route still answers (commit with no body is not a 415)', async () => {
    const res = await request(t.app).post('/api/imports/987654/commit').set(as('admin')).set('Content-Length', '0');
    expect(res.status).toBe(404);
  });
});

describe('multipart uploads', () => {
  const upload = () => request(t.app).post('/api/imports').set(as('admin'));
  const PART = '--XB\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\nContent-Type: text/csv\r\n\r\n';
  const cases: [name: string, status: number, send: () => request.Test][] = [
    ['no boundary', 400, () => upload().set('Content-Type', 'multipart/form-data').send('abc')],
    ['a body cut off mid-part', 400, () => upload().set('Content-Type', 'multipart/form-data; boundary=XB').send(`${PART}model,price\nA,1`)],
    ['a body cut off in the part headers', 400, () => upload().set('Content-Type', 'multipart/form-data; boundary=XB').send('--XB\r\nContent-Disposition: form-da')],
    ['garbage after the boundary line', 400, () => upload().set('Content-Type', 'multipart/form-data; boundary=XB').send('--XB\r\n\u0000\u0001garbage')],
    ['no parts at all', 400, () => upload().set('Content-Type', 'multipart/form-data; boundary=XB').send('nothing here')],
    ['a file in an unexpected field', 400, () => upload().field('kind', 'prices').attach('other', Buffer.from('model,price\nA,1\n'), 'a.csv')],
    ['two files', 400, () => upload().field('kind', 'prices').attach('file', Buffer.from('a\n'), 'a.csv').attach('file', Buffer.from('b\n'), 'b.csv')],
  ];

  it.each(cases)('when the upload has %s, then %i in the error shape', async (_name, status, send) => {
    expectErrorShape(await send(), status);
  });
});

describe('unique violations from the database', () => {
  /** A tiny app that throws the given error through the real error middleware. */
  const throwing = (err: unknown) => {
    const app = express();
    app.get('/x', () => {
      throw err;
    });
    app.use(errorMiddleware(pino({ level: 'silent' })));
    return app;
  };

  it('when SQLite refuses a duplicate e-mail, then 409 conflict naming the field', async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    const err = await repo.insert({ ...t.users.tech, id: undefined }).catch((e: unknown) => e);
    const res = await request(throwing(err)).get('/x');
    expectErrorShape(res, 409);
    expect(res.body.error).toMatchObject({ code: 'conflict', details: { field: 'email' } });
  });

  it('when PostgreSQL reports 23505, then 409 conflict naming the field', async () => {
    const err = Object.assign(new Error('duplicate key value violates unique constraint "users_email_key"'), {
      driverError: { code: '23505', detail: 'Key (email)=(someone@test.invalid) already exists.' },
    });
    const res = await request(throwing(err)).get('/x');
    expectErrorShape(res, 409);
    expect(res.body.error).toMatchObject({ code: 'conflict', details: { field: 'email' } });
    expect(JSON.stringify(res.body)).not.toContain('someone@test.invalid');
  });

  it('when an unknown error is thrown, then 500 with no detail', async () => {
    const res = await request(throwing(new Error('secret internals at /srv/app.js:1'))).get('/x');
    expectErrorShape(res, 500);
    expect(res.body.error.code).toBe('internal');
  });
});
