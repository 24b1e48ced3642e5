import bcrypt from 'bcryptjs';
import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../../shared/schemas/auth';
import { signToken } from '../../../server/auth/tokens';
import { uploadImport } from '../../../server/imports/imports.service';
import { User } from '../../../server/users/user.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// The standing auth-and-access suite (Issue 8): tokens, roles read from the database, every admin
// route for every role, canonical ids, and hostile query parameters. Never a 5xx, never a leak.

let t: TestApp;
/** The 22nd outdoor unit and the 10th user: ids a lenient parser would reach from "0x16" or "1e1". */
let unitIds: number[];
beforeAll(async () => {
  t = await createTestApp();
  // Invented models; only ids and lookups are under test.
  const rows = Array.from({ length: 25 }, (_, i) => `ZX-${100 + i},ac,R-454B,3`);
  await uploadImport(t.ctx, {
    buffer: Buffer.from(['model,system_type,refrigerant,nominal_tons', ...rows].join('\n')),
    fileName: 'units.csv',
    kind: 'outdoor-units',
    dryRun: false,
    userId: t.users.admin.id,
  });
  const units = await t.ctx.dataSource.query('SELECT id FROM outdoor_units ORDER BY id');
  unitIds = units.map((u: { id: number }) => u.id);
  const repo = t.ctx.dataSource.getRepository(User);
  const passwordHash = await bcrypt.hash('filler-password-1', 4);
  for (let i = 0; i < 20; i++) await repo.save(repo.create({ email: `filler.${i}@test.invalid`, name: `Filler ${i}`, role: 'tech', passwordHash, active: true }));
});
afterAll(async () => {
  await t.close();
});

const as = (role: Role) => ({ Authorization: `Bearer ${t.tokenFor(role)}` });
const b64 = (value: object) => Buffer.from(JSON.stringify(value)).toString('base64url');
const inAnHour = () => Math.floor(Date.now() / 1000) + 3600;
/** No stack trace, SQL or file path in an error body. */
const LEAK = /\bat .*\.(ts|js|mjs):\d+|SQLITE|QueryFailed|node_modules|SELECT |\/work\//i;

describe('tokens', () => {
  const tokens: [string, () => string][] = [
    ['a garbled token', () => 'not-a-token'],
    ['three garbage segments', () => 'aaa.bbb.ccc'],
    ['an empty bearer', () => ''],
    ['an expired token', () => jwt.sign({ role: 'admin', exp: Math.floor(Date.now() / 1000) - 60 }, t.ctx.config.jwtSecret, { subject: String(t.users.admin.id), algorithm: 'HS256' })],
    ['a token signed with another secret', () => jwt.sign({ role: 'admin' }, 'another-secret-of-enough-length!', { subject: String(t.users.admin.id), algorithm: 'HS256', expiresIn: '1h' })],
    ['an alg:none token', () => `${b64({ alg: 'none', typ: 'JWT' })}.${b64({ sub: String(t.users.admin.id), role: 'admin', exp: inAnHour() })}.`],
    ['a token with no exp', () => jwt.sign({ role: 'admin' }, t.ctx.config.jwtSecret, { subject: String(t.users.admin.id), algorithm: 'HS256' })],
    ['an HS512 token (only HS256 is accepted)', () => jwt.sign({ role: 'admin' }, t.ctx.config.jwtSecret, { subject: String(t.users.admin.id), algorithm: 'HS512', expiresIn: '1h' })],
    ['a token whose role was raised after signing', () => {
      const [header, , signature] = t.tokenFor('tech').split('.');
      return `${header}.${b64({ sub: String(t.users.tech.id), role: 'admin', exp: inAnHour() })}.${signature}`;
    }],
    ['a token for a user that does not exist', () => signToken(t.ctx.config.jwtSecret, { userId: 999_999, role: 'admin' })],
    ['a token with a non-canonical subject', () => jwt.sign({ role: 'admin' }, t.ctx.config.jwtSecret, { subject: `0${t.users.admin.id}`, algorithm: 'HS256', expiresIn: '1h' })],
  ];

  it.each(tokens)('when the request carries %s, then 401 with no leak', async (_name, make) => {
    const res = await request(t.app).get('/api/users').set('Authorization', `Bearer ${make()}`);
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthorized');
    expect(JSON.stringify(res.body)).not.toMatch(LEAK);
  });

  it.each([
    ['no Authorization header', undefined],
    ['a Basic header', `Basic ${Buffer.from('admin@test.invalid:test-password-123').toString('base64')}`],
  ])('when the request has %s, then 401', async (_name, header) => {
    const req = request(t.app).get('/api/auth/me');
    if (header) req.set('Authorization', header);
    expect((await req).status).toBe(401);
  });
});

describe('users whose account changed while their token is alive', () => {
  const makeUser = async (role: Role, email: string) => {
    const repo = t.ctx.dataSource.getRepository(User);
    const user = await repo.save(repo.create({ email, name: email, role, passwordHash: 'x', active: true }));
    return { user, token: signToken(t.ctx.config.jwtSecret, { userId: user.id, role }) };
  };

  it('when an admin is deactivated, then their token is refused everywhere', async () => {
    const { user, token } = await makeUser('admin', 'gone.admin@test.invalid');
    await t.ctx.dataSource.getRepository(User).update({ id: user.id }, { active: false });
    for (const path of ['/api/users', '/api/auth/me', '/api/catalog/outdoor-units']) {
      expect((await request(t.app).get(path).set('Authorization', `Bearer ${token}`)).status).toBe(401);
    }
  });

  it('when an admin is demoted to tech, then their admin-claiming token gets 403 on admin routes', async () => {
    const { user, token } = await makeUser('admin', 'demoted.admin@test.invalid');
    await t.ctx.dataSource.getRepository(User).update({ id: user.id }, { role: 'tech' });
    expect((await request(t.app).get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(403);
    expect((await request(t.app).put('/api/settings/rules').set('Authorization', `Bearer ${token}`).send({})).status).toBe(403);
  });

  it('when a tech is promoted, then the same token reaches admin routes (the role comes from the database)', async () => {
    const { user, token } = await makeUser('tech', 'promoted.tech@test.invalid');
    await t.ctx.dataSource.getRepository(User).update({ id: user.id }, { role: 'admin' });
    expect((await request(t.app).get('/api/users').set('Authorization', `Bearer ${token}`)).status).toBe(200);
  });
});

describe('admin routes by role', () => {
  // Every admin-only route that exists. Import ids that do not exist: the guard is under test, and an
  // admin's commit or revert of a real import would change this file's data (admin then gets 404).
  const ADMIN_ROUTES: [method: 'get' | 'post' | 'patch' | 'put', path: string][] = [
    ['get', '/api/users'],
    ['post', '/api/users'],
    ['patch', '/api/users/1'],
    ['get', '/api/imports'],
    ['post', '/api/imports'],
    ['get', '/api/imports/987654'],
    ['post', '/api/imports/987654/commit'],
    ['post', '/api/imports/987654/revert'],
    ['get', '/api/imports/987654/errors'],
    ['get', '/api/imports/templates/prices'],
    ['put', '/api/settings/rules'],
  ];
  const cases = ADMIN_ROUTES.flatMap(([method, path]) => (['none', 'tech', 'estimator', 'admin'] as const).map((role) => [method, path, role] as const));

  it.each(cases)('when %s %s is called as %s, then only an admin gets past the guard', async (method, path, role) => {
    const req = request(t.app)[method](path);
    if (role !== 'none') req.set(as(role));
    const res = await req.send({});
    if (role === 'none') expect(res.status).toBe(401);
    else if (role !== 'admin') expect(res.status).toBe(403);
    else expect([401, 403]).not.toContain(res.status);
    expect(res.status).toBeLessThan(500);
  });
});

describe('ids in paths', () => {
  /** Spellings of n that a lenient parser (Number(), parseInt) reads as n or as another item. */
  const spellings = (n: number) => [`0${n}`, `0x${n.toString(16)}`, `${n}.0`, `+${n}`, `%20${n}`, `${n}%20`, `-${n}`, `${n}e0`, `0b${n.toString(2)}`, `${n}abc`, `${n}%00`];
  const others = ['0', '-0', 'abc', '99999999999999999999', '1e1', '%E0%A4%A'];

  it('when the canonical id is used, then the item is found (control)', async () => {
    const res = await request(t.app).get(`/api/catalog/outdoor-units/${unitIds[21]}`).set(as('tech'));
    expect(res.status).toBe(200);
    expect(res.body.item.model).toBe('ZX-121');
  });

  it.each([...spellings(22), ...others])('when a catalog item is asked for as "%s", then 400 or 404, never an item', async (id) => {
    const res = await request(t.app).get(`/api/catalog/outdoor-units/${id}`).set(as('tech'));
    expect([400, 404]).toContain(res.status);
    expect(res.body.item).toBeUndefined();
  });

  it.each([...spellings(10), ...others])('when a user is patched as "%s", then 400 or 404 and nobody is renamed', async (id) => {
    const res = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ name: 'Renamed by a bad id' });
    expect([400, 404]).toContain(res.status);
    expect(await t.ctx.dataSource.getRepository(User).countBy({ name: 'Renamed by a bad id' })).toBe(0);
  });

  it.each([...spellings(1), '0'])('when an import is asked for as "%s", then 400 or 404', async (id) => {
    const res = await request(t.app).get(`/api/imports/${id}`).set(as('admin'));
    expect([400, 404]).toContain(res.status);
  });

  it('when ids do not exist, then 404 on each router', async () => {
    expect((await request(t.app).get('/api/catalog/outdoor-units/987654').set(as('tech'))).status).toBe(404);
    expect((await request(t.app).patch('/api/users/987654').set(as('admin')).send({ name: 'x' })).status).toBe(404);
    expect((await request(t.app).get('/api/imports/987654').set(as('admin'))).status).toBe(404);
  });
});

describe('hostile query parameters on catalog search', () => {
  const PAYLOADS = ["' OR 1=1 --", '"; DROP TABLE users; --', '; rm -rf /', '$(id)', '`id`', '| cat /etc/passwd', '%00', '\u0000', '../../etc/passwd', '${7*7}', '<script>x</script>', "1' UNION SELECT email FROM users --"];
  const PARAMS = ['q', 'refrigerant', 'tons', 'page', 'pageSize'];
  const cases = PARAMS.flatMap((param) => PAYLOADS.map((payload) => [param, payload] as const));

  it.each(cases)('when %s is %j, then 2xx or 4xx with no leak', async (param, payload) => {
    const res = await request(t.app).get('/api/catalog/outdoor-units').query({ [param]: payload }).set(as('tech'));
    expect(res.status).toBeLessThan(500);
    expect([200, 400]).toContain(res.status);
    const text = JSON.stringify(res.body);
    expect(text).not.toMatch(LEAK);
    expect(text).not.toMatch(/@test\.invalid|passwordHash|root:/);
  });

  it('when all of that has run, then the users table is intact', async () => {
    expect(await t.ctx.dataSource.getRepository(User).countBy({ role: 'admin' })).toBeGreaterThan(0);
  });
});

describe('admins and their own account (Issue 7)', () => {
  const self = () => `/api/users/${t.users.admin.id}`;

  it.each([
    ['demote themselves', { role: 'tech' }, 'role'],
    ['make themselves an estimator', { role: 'estimator' }, 'role'],
    ['deactivate themselves', { active: false }, 'active'],
  ])('when an admin tries to %s (another admin exists), then 409 with a plain reason and nothing changes', async (_name, patch, field) => {
    const repo = t.ctx.dataSource.getRepository(User);
    const other = await repo.save(repo.create({ email: `other.admin.${field}.${Date.now()}@test.invalid`, name: 'Other', role: 'admin', passwordHash: 'x', active: true }));
    const res = await request(t.app).patch(self()).set(as('admin')).send(patch);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/your own/i);
    expect(res.body.error.details).toEqual({ field });
    expect(await repo.findOneByOrFail({ id: t.users.admin.id })).toMatchObject({ role: 'admin', active: true });
    await repo.delete({ id: other.id });
  });

  it('when an admin renames themselves or sends their own unchanged role, then 200', async () => {
    const res = await request(t.app).patch(self()).set(as('admin')).send({ name: 'Still Admin', role: 'admin', active: true });
    expect(res.status).toBe(200);
    expect(res.body.user).toMatchObject({ name: 'Still Admin', role: 'admin', active: true });
  });
});

describe('prices by role', () => {
  beforeAll(async () => {
    // An invented distributor and price: only who sees the amount is under test.
    await uploadImport(t.ctx, { buffer: Buffer.from('model,price,effective_from\nZX-101,1234.50,2020-01-01\n'), fileName: 'p.csv', kind: 'prices', distributor: 'Harbor Supply', dryRun: false, userId: t.users.admin.id });
  });

  it.each([
    ['tech', false],
    ['estimator', true],
    ['admin', true],
  ] as const)('when a %s opens a stocked part, then amounts are shown: %s', async (role, shown) => {
    const res = await request(t.app).get(`/api/catalog/outdoor-units/${unitIds[1]}`).set(as(role));
    expect(res.status).toBe(200);
    expect(res.body.pricesVisible).toBe(shown);
    expect(res.body.prices).toHaveLength(1);
    expect(res.body.prices[0]).toMatchObject({ distributor: 'Harbor Supply', inStock: true });
    if (shown) expect(res.body.prices[0].priceCents).toBe(123450);
    else expect(JSON.stringify(res.body)).not.toMatch(/priceCents|123450|currency/);
  });
});
