/**
 * The floor under bench/checks-api.bench.ts: the app's own middleware (server/app-middleware.ts: helmet, the
 * request log, body-type check, JSON parsing, change scope) and its health route, plus a POST /api/checks that
 * answers with a stored copy of a real check's answer (the BENCH_ANSWER environment variable) and does no work at all: no auth,
 * no validation, no catalog, no rules. Its checks ÷ health rate is the most any check handler could reach
 * on this machine. Prints one line of JSON with the port when it listens.
 */
import type { AddressInfo } from 'node:net';
import express from 'express';
import pino from 'pino';
import { health, useCommonMiddleware } from '../server/app-middleware';
import type { AppConfig } from '../server/env';

const answer: unknown = JSON.parse(process.env.BENCH_ANSWER!);
const app = express();
useCommonMiddleware(app, { config: { trustProxy: false } as AppConfig, logger: pino({ level: 'silent' }) });
app.get('/api/health', health);
app.post('/api/checks', (_req, res) => {
  res.json(answer);
});
const server = app.listen(0, '127.0.0.1', () => {
  console.log(JSON.stringify({ port: (server.address() as AddressInfo).port }));
});
process.on('SIGTERM', () => server.close(() => process.exit(0)));
