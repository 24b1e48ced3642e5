/**
 * Not a benchmark: a diagnostic. One cold /sign-in load in Chromium with 4× CPU throttling (as
 * bench/web-offline.bench.ts measures it) under DevTools' sampling profiler, then the top self-time
 * functions grouped by script and by function. Run: `node --import tsx bench/web-profile.ts [out.cpuprofile]`
 * after `node scripts/build-web.mjs`; it starts the bench server itself
 * (WEB_DIR=<dir> serves another export, for an A/B against an older build).
 */
import { spawn } from 'node:child_process';
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { createInterface } from 'node:readline';
import { launchChromium } from '../tests/e2e/chromium';
import { shownAtScript } from '../tests/e2e/page-timing';

const root = path.resolve(__dirname, '..');

interface ProfileNode {
  id: number;
  callFrame: { functionName: string; url: string; lineNumber: number; columnNumber: number };
  children?: number[];
}
interface Profile {
  nodes: ProfileNode[];
  samples: number[];
  timeDeltas: number[];
  startTime: number;
}

/** `--runs N`: no profiler, N cold loads, each stamp printed (quick before/after checks). */
async function timedLoads(browser: import('playwright-core').Browser, base: string, runs: number) {
  const times: number[] = [];
  const cpu: number[] = [];
  const script: number[] = [];
  for (let i = 0; i < runs; i++) {
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, baseURL: base, serviceWorkers: 'block' });
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    await cdp.send('Performance.enable', { timeDomain: 'threadTicks' });
    await page.addInitScript(shownAtScript('[data-testid="sign-in-email"]'));
    await page.goto('/sign-in');
    await page.waitForSelector('[data-testid="sign-in-email"]', { state: 'attached', timeout: 60_000 });
    // CPU time of the page's process so far (the stamp plus the moment the wait takes to notice): unlike the
    // wall-clock stamp, it barely moves with the machine's load, so it compares builds on a busy machine.
    const { metrics } = (await cdp.send('Performance.getMetrics')) as { metrics: { name: string; value: number }[] };
    const metric = (name: string) => Math.round((metrics.find((m) => m.name === name)?.value ?? 0) * 1000);
    cpu.push(metric('ProcessTime'));
    script.push(metric('ScriptDuration'));
    await page.waitForTimeout(100);
    times.push(Math.round(await page.evaluate<number>('window.__shownAt')));
    await context.close();
  }
  const sorted = [...times].sort((a, b) => a - b);
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  console.log(`process CPU ${cpu.join(', ')} (median ${median(cpu)} ms); script ${script.join(', ')} (median ${median(script)} ms)`);
  console.log(`stamps ${times.join(', ')}; median ${sorted[Math.floor(sorted.length / 2)]} ms; load ${(await import('node:os')).loadavg()[0].toFixed(1)}`);
}

async function main() {
  const runsAt = process.argv.indexOf('--runs');
  const runs = runsAt > 0 ? Number(process.argv[runsAt + 1]) : 0;
  const out = runs ? undefined : process.argv[2];
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(__dirname, 'checks-server.ts')], {
    cwd: root,
    env: { ...process.env, TSX_TSCONFIG_PATH: path.join(root, 'server/tsconfig.json'), TANDEM_WEB_DIR: process.env.WEB_DIR ?? path.join(root, 'dist') },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const line = await new Promise<string>((resolve) => createInterface({ input: child.stdout! }).once('line', resolve));
  const { port } = JSON.parse(line) as { port: number };
  const browser = await launchChromium();
  try {
    if (runs) return await timedLoads(browser, `http://127.0.0.1:${port}`, runs);
    const context = await browser.newContext({ viewport: { width: 390, height: 844 }, baseURL: `http://127.0.0.1:${port}`, serviceWorkers: 'block' });
    const page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Emulation.setCPUThrottlingRate', { rate: 4 });
    await cdp.send('Profiler.enable');
    await cdp.send('Profiler.setSamplingInterval', { interval: 200 });
    await page.addInitScript(shownAtScript('[data-testid="sign-in-email"]'));
    await cdp.send('Profiler.start');
    await page.goto('/sign-in');
    await page.waitForSelector('[data-testid="sign-in-email"]', { state: 'attached', timeout: 60_000 });
    await page.waitForTimeout(300);
    const { profile } = (await cdp.send('Profiler.stop')) as unknown as { profile: Profile };
    const shownAt = await page.evaluate<number>('window.__shownAt');
    const marks = await page.evaluate<string>(
      'JSON.stringify(performance.getEntriesByType("navigation").map(e => ({resp: e.responseEnd, dcl: e.domContentLoadedEventEnd})).concat(performance.getEntriesByType("resource").map(e => ({n: e.name.slice(-60), s: Math.round(e.startTime), e: Math.round(e.responseEnd)}))))',
    );
    if (out) writeFileSync(out, JSON.stringify(profile));
    const byId = new Map(profile.nodes.map((n) => [n.id, n]));
    const self = new Map<number, number>();
    profile.samples.forEach((id, i) => self.set(id, (self.get(id) ?? 0) + (profile.timeDeltas[i] ?? 0) / 1000));
    const group = (key: (n: ProfileNode) => string) => {
      const sums = new Map<string, number>();
      for (const [id, ms] of self) {
        const k = key(byId.get(id)!);
        sums.set(k, (sums.get(k) ?? 0) + ms);
      }
      return [...sums].sort((a, b) => b[1] - a[1]);
    };
    console.log(`form stamped at ${Math.round(shownAt)} ms; resources ${marks}`);
    console.log('self time by script:');
    for (const [k, ms] of group((n) => n.callFrame.url.split('/').pop() || `(${n.callFrame.functionName})`).slice(0, 10)) console.log(`  ${ms.toFixed(0).padStart(6)} ms  ${k}`);
    console.log('self time by function:');
    for (const [k, ms] of group((n) => `${n.callFrame.functionName || '(anon)'} ${n.callFrame.url.split('/').pop()}:${n.callFrame.lineNumber}:${n.callFrame.columnNumber}`).slice(0, 40))
      console.log(`  ${ms.toFixed(0).padStart(6)} ms  ${k}`);
  } finally {
    await browser.close();
    child.kill('SIGTERM');
  }
}

main().catch((err) => {
  console.error(err);
  process.exit(1);
});
