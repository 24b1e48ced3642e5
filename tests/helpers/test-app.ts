import { randomBytes } from 'node:crypto';
import path from 'node:path';
import bcrypt from 'bcryptjs';
import type { Express } from 'express';
import pino from 'pino';
import type { Role } from '../../shared/schemas/auth';
import { createApp } from '../../server/app';
import { signToken } from '../../server/auth/tokens';
import type { AppContext } from '../../server/context';
import { isPostgresUrl, openDatabase } from '../../server/db/data-source';
import { databaseTarget, type AppConfig } from '../../server/env';
import { User } from '../../server/users/user.entity';
import { createTestDatabase } from './test-database';

/** The password of every user createTestApp makes. */
export const TEST_PASSWORD = 'test-password-123';

export interface TestApp {
  app: Express;
  ctx: AppContext;
  tokenFor(role: Role): string;
  users: Record<Role, User>;
  close(): Promise<void>;
}

/**
 * A fresh app on its own database — a temp SQLite file, or a new PostgreSQL database in the api-pg
 * project (tests/helpers/test-database.ts) — with a silent logger, a random JWT secret and one active
 * user per role. Call close() in afterAll/afterEach: it closes and drops the database and removes the folder.
 */
export async function createTestApp(overrides: Partial<AppConfig> = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const dir = database.dir;
  const webDir = path.join(dir, 'web');
  const onPostgresUrl = isPostgresUrl(database.target) ? database.target : undefined;
  const config: AppConfig = {
    port: 0,
    databasePath: onPostgresUrl ? path.join(dir, 'unused.sqlite') : database.target,
    databaseUrl: onPostgresUrl,
    dataDir: dir,
    demo: false,
    jwtSecret: randomBytes(32).toString('hex'),
    webDir,
    logLevel: 'silent',
    signInLimit: 10_000,
    ...overrides,
  };
  const dataSource = await openDatabase(databaseTarget(config));
  const ctx: AppContext = { dataSource, config, logger: pino({ level: 'silent' }) };

  // A low bcrypt cost keeps the helper fast; the strength of the hash is not under test here.
  const passwordHash = await bcrypt.hash(TEST_PASSWORD, 4);
  const repo = dataSource.getRepository(User);
  const roles: Role[] = ['tech', 'estimator', 'admin'];
  const users = {} as Record<Role, User>;
  for (const role of roles) {
    users[role] = await repo.save(
      repo.create({ email: `${role}@test.invalid`, name: `Test ${role}`, role, passwordHash, active: true }),
    );
  }

  const app = createApp(ctx);
  return {
    app,
    ctx,
    users,
    tokenFor: (role) => signToken(config.jwtSecret, { userId: users[role].id, role }),
    close: async () => {
      if (dataSource.isInitialized) await dataSource.destroy();
      await database.drop();
    },
  };
}
