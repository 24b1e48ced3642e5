// npm run server: the server on the last web build, no build step.
import { runTs } from './server-process.mjs';

runTs('server/index.ts');
