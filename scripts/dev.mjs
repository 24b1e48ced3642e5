// npm run dev: the API server restarting on change (port 8080) and Expo's web dev server (8081)
// talking to it. Open http://localhost:8081.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { root } from './server-process.mjs';

const env = { ...process.env, TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json') };
const children = [
  spawn(process.execPath, [path.join(root, 'node_modules/tsx/dist/cli.mjs'), 'watch', 'server/index.ts'], {
    cwd: root,
    stdio: 'inherit',
    env: { ...env, TANDEM_DEMO: process.env.TANDEM_DEMO ?? '1', TANDEM_CORS_ORIGIN: 'http://localhost:8081' },
  }),
  spawn(process.execPath, [path.join(root, 'node_modules/expo/bin/cli'), 'start', '--web', '--port', '8081'], {
    cwd: root,
    stdio: 'inherit',
    env: { ...env, EXPO_PUBLIC_API_URL: 'http://localhost:8080', EXPO_OFFLINE: '1', EXPO_NO_TELEMETRY: '1' },
  }),
];
const stop = () => children.forEach((c) => c.kill('SIGTERM'));
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
children.forEach((c) => c.on('exit', stop));
