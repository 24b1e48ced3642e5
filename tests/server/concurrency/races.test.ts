import type { Server } from 'node:http';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { TransitionRule } from '../../../shared/rules/types';
import { signToken } from '../../../server/auth/tokens';
import { User } from '../../../server/users/user.entity';
import { createTestApp, type TestApp } from '../../helpers/test-app';

// The races of Issue 8 item 1, each run 20 times against a LISTENING server: the two requests of a
// round are in flight together and interleave wherever the server awaits (bcrypt, the database).
const ROUNDS = 20;

let t: TestApp;
let server: Server;
beforeAll(async () => {
  t = await createTestApp();
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((resolve) => server.once('listening', resolve));
});
afterAll(async () => {
  await new Promise((resolve) => server.close(resolve));
  await t.close();
});

const bearer = (user: User) => ({ Authorization: `Bearer ${signToken(t.ctx.config.jwtSecret, { userId: user.id, role: user.role })}` });
const activeAdmins = () => t.ctx.dataSource.getRepository(User).countBy({ role: 'admin', active: true });

describe('two admins demote each other at the same moment, each with a password change', () => {
  let first: User;
  let second: User;
  beforeAll(async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    const passwordHash = await bcrypt.hash('race-password-1', 4);
    first = await repo.save(repo.create({ email: 'first.admin@test.invalid', name: 'First', role: 'admin', passwordHash, active: true }));
    second = await repo.save(repo.create({ email: 'second.admin@test.invalid', name: 'Second', role: 'admin', passwordHash, active: true }));
    // Only these two are active admins, so each demotion alone is allowed and both together are not.
    await repo.update({ id: t.users.admin.id }, { active: false });
  });
  afterAll(async () => {
    await t.ctx.dataSource.getRepository(User).update({ id: t.users.admin.id }, { active: true });
  });

  it.each(Array.from({ length: ROUNDS }, (_, round) => round))('when round %i runs, then exactly one wins and an active admin remains', async () => {
    const repo = t.ctx.dataSource.getRepository(User);
    await repo.update({ id: first.id }, { role: 'admin', active: true });
    await repo.update({ id: second.id }, { role: 'admin', active: true });
    const [a, b] = await Promise.all([
      request(server).patch(`/api/users/${second.id}`).set(bearer(first)).send({ role: 'tech', password: 'changed-password-1' }),
      request(server).patch(`/api/users/${first.id}`).set(bearer(second)).send({ role: 'tech', password: 'changed-password-2' }),
    ]);
    const statuses = [a.status, b.status].sort();
    expect(statuses[0]).toBe(200);
    // The loser is refused as the last admin (409) or, if the winner committed first, no longer an admin (403).
    expect([403, 409]).toContain(statuses[1]);
    expect(await activeAdmins()).toBe(1);
  });
});

describe('two identical POST /api/users at once', () => {
  it.each(Array.from({ length: ROUNDS }, (_, round) => round))('when round %i runs, then one 201 and one 409 naming the e-mail', async (round) => {
    const body = { email: `twin.${round}@test.invalid`, name: 'Twin', role: 'tech', password: 'twin-password-1' };
    const responses = await Promise.all([0, 1].map(() => request(server).post('/api/users').set(bearer(t.users.admin)).send(body)));
    expect(responses.map((r) => r.status).sort()).toEqual([201, 409]);
    const refused = responses.find((r) => r.status === 409)!;
    expect(refused.body.error).toMatchObject({ code: 'email-taken', details: { field: 'email' } });
    expect(await t.ctx.dataSource.getRepository(User).countBy({ email: body.email })).toBe(1);
  });
});

describe('concurrent settings saves', () => {
  const put = (body: object) => request(server).put('/api/settings/rules').set(bearer(t.users.admin)).send(body);
  let rules: TransitionRule[];
  beforeAll(async () => {
    rules = (await request(server).get('/api/settings/rules').set(bearer(t.users.admin)).expect(200)).body.transitionRules;
    expect(rules.length).toBeGreaterThan(1);
  });

  it.each(Array.from({ length: ROUNDS }, (_, round) => round))('when round %i saves two different bodies at once, then what is stored is exactly one of them', async (round) => {
    const current = (await request(server).get('/api/settings/rules').set(bearer(t.users.admin)).expect(200)).body;
    // Two admins' edits: different numbers, different notes, and one drops a rule. The numbers are
    // within the schema's ranges only (common practice (no source): 350–450 CFM/ton is the default band).
    const bodyA = {
      settings: { ...current.settings, cfmPerTonMin: 340, cfmPerTonMax: 440 + round },
      transitionRules: rules.map((r) => ({ ...r, note: `A${round}` })),
    };
    const bodyB = {
      settings: { ...current.settings, cfmPerTonMin: 360, cfmPerTonMax: 460 + round },
      transitionRules: rules.slice(1).map((r) => ({ ...r, note: `B${round}` })),
    };
    const [a, b] = await Promise.all([put(bodyA), put(bodyB)]);
    expect([a.status, b.status]).toEqual([200, 200]);
    const stored = (await request(server).get('/api/settings/rules').set(bearer(t.users.admin)).expect(200)).body;
    const picked = stored.settings.cfmPerTonMin === 340 ? bodyA : bodyB;
    expect(stored.settings).toEqual(picked.settings);
    expect(stored.transitionRules).toEqual(picked.transitionRules);
  });
});
