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

const as = (role: 'tech' | 'estimator' | 'admin') => ({ Authorization: `Bearer ${t.tokenFor(role)}` });

describe('admin user management', () => {
  it('when a tech or estimator calls /api/users, then 403', async () => {
    for (const role of ['tech', 'estimator'] as const) {
      const res = await request(t.app).get('/api/users').set(as(role));
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
  });

  it('when an admin adds a user, then that user can sign in with the given role', async () => {
    const created = await request(t.app)
      .post('/api/users')
      .set(as('admin'))
      .send({ email: 'new.tech@test.invalid', name: 'New Tech', role: 'tech', password: 'first-password-1' });
    expect(created.status).toBe(201);
    expect(created.body.user).toMatchObject({ email: 'new.tech@test.invalid', role: 'tech', active: true });
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: 'new.tech@test.invalid', password: 'first-password-1' });
    expect(signIn.status).toBe(200);
    const dup = await request(t.app)
      .post('/api/users')
      .set(as('admin'))
      .send({ email: 'new.tech@test.invalid', name: 'Again', role: 'tech', password: 'first-password-1' });
    expect(dup.status).toBe(409);
  });

  it('when the password is short or the role unknown, then 422 names the fields', async () => {
    const res = await request(t.app).post('/api/users').set(as('admin')).send({ email: 'x@test.invalid', name: 'X', role: 'owner', password: 'short' });
    expect(res.status).toBe(422);
    const paths = res.body.error.details.map((d: { path: string }) => d.path);
    expect(paths).toEqual(expect.arrayContaining(['role', 'password']));
  });

  it('when an admin changes a role, resets a password and deactivates, then each takes effect', async () => {
    const id = t.users.estimator.id;
    const promoted = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ role: 'tech', name: 'Renamed' });
    expect(promoted.status).toBe(200);
    expect(promoted.body.user).toMatchObject({ role: 'tech', name: 'Renamed' });
    const reset = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ password: 'a-new-password-2' });
    expect(reset.status).toBe(200);
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: 'estimator@test.invalid', password: 'a-new-password-2' });
    expect(signIn.status).toBe(200);
    const off = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ active: false });
    expect(off.body.user.active).toBe(false);
  });

  it('when the last active admin would be demoted or deactivated, then 409 and nothing changes', async () => {
    const id = t.users.admin.id;
    const demote = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ role: 'tech' });
    expect(demote.status).toBe(409);
    const deactivate = await request(t.app).patch(`/api/users/${id}`).set(as('admin')).send({ active: false });
    expect(deactivate.status).toBe(409);
    const list = await request(t.app).get('/api/users').set(as('admin'));
    expect(list.body.items.find((u: { id: number }) => u.id === id)).toMatchObject({ role: 'admin', active: true });
  });

  it('when the id is not a number or unknown fields are sent, then 400 / 422', async () => {
    expect((await request(t.app).patch('/api/users/abc').set(as('admin')).send({ name: 'x' })).status).toBe(400);
    expect((await request(t.app).patch(`/api/users/${t.users.tech.id}`).set(as('admin')).send({ email: 'x@y.z' })).status).toBe(422);
    expect((await request(t.app).patch('/api/users/99999').set(as('admin')).send({ name: 'x' })).status).toBe(404);
  });
});

describe('own password', () => {
  it('when the current password is wrong, then 422; when right, then the new one works', async () => {
    const bad = await request(t.app).post('/api/auth/password').set(as('tech')).send({ currentPassword: 'nope', newPassword: 'another-password-9' });
    expect(bad.status).toBe(422);
    const good = await request(t.app)
      .post('/api/auth/password')
      .set(as('tech'))
      .send({ currentPassword: 'test-password-123', newPassword: 'another-password-9' });
    expect(good.status).toBe(200);
    const signIn = await request(t.app).post('/api/auth/sign-in').send({ email: 'tech@test.invalid', password: 'another-password-9' });
    expect(signIn.status).toBe(200);
  });
});
