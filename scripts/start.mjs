// npm start: build the web app if its sources changed, then run the server in demo mode.
import { buildWeb } from './build-web.mjs';
import { runTs } from './server-process.mjs';

try {
  buildWeb();
} catch (err) {
  console.error(err.message);
  process.exit(1);
}
runTs('server/index.ts', [], { TANDEM_DEMO: process.env.TANDEM_DEMO ?? '1' });
