#!/usr/bin/env node
// node scripts/with-postgres.mjs [--if-available] <command> [args…]
// Starts a throwaway PostgreSQL cluster (scripts/postgres-cluster.mjs), runs the command with
// TANDEM_TEST_DATABASE_URL set to it, then stops and removes the cluster. With --if-available and no
// PostgreSQL installed, it says so and exits 0 without running the command.
import { spawn } from 'node:child_process';
import { postgresBinDir, startCluster } from './postgres-cluster.mjs';

const args = process.argv.slice(2);
const optional = args[0] === '--if-available';
const command = optional ? args.slice(1) : args;
if (command.length === 0) {
  console.error('usage: node scripts/with-postgres.mjs [--if-available] <command> [args…]');
  process.exit(2);
}
if (!postgresBinDir()) {
  if (optional) {
    console.log('skipped: no PostgreSQL (install Debian’s postgresql to run this on PostgreSQL too)');
    process.exit(0);
  }
  console.error('no PostgreSQL found: install Debian’s postgresql or set PG_BIN');
  process.exit(1);
}

const cluster = await startCluster();
console.log(`PostgreSQL cluster on 127.0.0.1:${cluster.port}`);
const child = spawn(command[0], command.slice(1), {
  stdio: 'inherit',
  shell: process.platform === 'win32',
  env: { ...process.env, TANDEM_TEST_DATABASE_URL: cluster.url },
});
for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
child.on('exit', async (code, signal) => {
  await cluster.stop().catch((err) => console.error(err));
  process.exit(code ?? (signal ? 1 : 0));
});
