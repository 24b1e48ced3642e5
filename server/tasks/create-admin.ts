import 'reflect-metadata';
import { createInterface } from 'node:readline/promises';
import { UserCreateSchema } from '../../shared/schemas/auth';
import { openDatabase } from '../db/data-source';
import { databaseTarget, loadConfig } from '../env';
import { createLogger } from '../lib/logger';
import { createUser } from '../users/users.service';

/**
 * npm run create-admin: makes an admin on a database without the demo (TANDEM_DEMO=0).
 * Takes --email, --name, --password, or asks for what is missing.
 */
function flag(name: string): string | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i >= 0 ? process.argv[i + 1] : undefined;
}

/** Answers to the questions, one a line: asked at a terminal, or read from piped input. */
function answerSource() {
  const rl = createInterface({ input: process.stdin, output: process.stdout, terminal: process.stdin.isTTY });
  const piped = process.stdin.isTTY ? null : rl[Symbol.asyncIterator]();
  return {
    ask: async (question: string) => {
      if (!piped) return rl.question(question);
      const next = await piped.next();
      return next.done ? '' : next.value;
    },
    close: () => rl.close(),
  };
}

async function main() {
  const rl = answerSource();
  const ask = async (name: string, question: string) => flag(name) ?? (await rl.ask(question));
  const input = UserCreateSchema.safeParse({
    email: await ask('email', 'E-mail: '),
    name: await ask('name', 'Name: '),
    password: await ask('password', 'Password (at least 10 characters): '),
    role: 'admin',
  });
  rl.close();
  if (!input.success) {
    console.error(input.error.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('\n'));
    process.exit(2);
  }
  const config = loadConfig();
  const dataSource = await openDatabase(databaseTarget(config));
  const user = await createUser({ dataSource, config, logger: createLogger({ logLevel: 'warn' }) }, input.data);
  await dataSource.destroy();
  console.log(`admin ${user.email} created`);
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
