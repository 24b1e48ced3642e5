// npm run bench [name…]: every benchmark in bench/, one after another, in one Node process.
import { runTs } from './server-process.mjs';

runTs('bench/run.ts', process.argv.slice(2), { TANDEM_LOG_LEVEL: 'silent' });
