// npm run seed | create-admin | backup: one-off server tasks in server/tasks/.
import { runTs } from './server-process.mjs';

const task = process.argv[2];
const tasks = { seed: 'server/tasks/seed.ts', 'create-admin': 'server/tasks/create-admin.ts', backup: 'server/tasks/backup.ts' };
if (!tasks[task]) {
  console.error(`unknown task ${task}; one of ${Object.keys(tasks).join(', ')}`);
  process.exit(2);
}
runTs(tasks[task], process.argv.slice(3));
