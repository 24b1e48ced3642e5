// npm start: build the web app if its sources changed, bundle the server (about a second), then run
// the bundle in demo mode. Production runs the bundle: a check costs about half what it does under tsx.
import { buildWeb } from './build-web.mjs';
import { bundleServer } from './bundle-server.mjs';
import { runBundle } from './server-process.mjs';

let server;
try {
  buildWeb();
  server = await bundleServer('server/index.ts', 'build/server/index.cjs');
} catch (err) {
  console.error(err.message);
  process.exit(1);
}
runBundle(server, [], { TANDEM_DEMO: process.env.TANDEM_DEMO ?? '1' });
