import { killDuringCommits } from './kill-harness';
import { round, type Measure } from './measure';

const ROUNDS = 50;

/** Soak (`npm run bench -- --soak`): 50 kill -9 rounds during 20,000-row price commits, each followed by a restart. */
export async function run(): Promise<Measure[]> {
  const report = await killDuringCommits(ROUNDS, 20_000, 2_500);
  const bad = report.rounds.filter((r) => r.integrity !== 'ok' || r.partial.length > 0);
  for (const r of bad) console.error(`killed after ${r.killAfterMs} ms: integrity ${r.integrity}; ${r.partial.join('; ')}`);
  const before = report.rounds.filter((r) => !r.answered).length;
  return [
    { id: 'soak.kill-9.rounds-held', value: ROUNDS - bad.length, unit: 'rounds', baseline: ROUNDS, ratio: round((ROUNDS - bad.length) / ROUNDS, 3), note: `integrity ok and each import whole or absent after every restart; ${before} kills landed before the answer, ${report.committed} imports committed, ${report.absent} absent` },
  ];
}
