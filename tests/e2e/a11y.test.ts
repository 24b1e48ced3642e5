import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { launchBrowser, VIEWPORTS, type ViewportName } from './browser';
import { AUDIT_SCREENS, seedAuditData, signInFor } from './audit-screens';
import { saveShot } from './shots';

/**
 * axe-core on every screen at both viewports: no serious or critical violation (WCAG 2.x A/AA rules
 * as axe-core 4.14 ships them). The screens are listed once, in audit-screens.ts.
 */

const AXE_SOURCE = readFileSync(path.resolve(__dirname, '../../node_modules/axe-core/axe.min.js'), 'utf8');

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[]; html: string; failureSummary?: string }[];
}

async function seriousViolations(page: Page): Promise<AxeViolation[]> {
  await page.addScriptTag({ content: AXE_SOURCE });
  const violations = await page.evaluate(async () => {
    // The server tsconfig these tests compile under has no DOM lib: reach the page's globals untyped.
    const page = globalThis as unknown as { axe: { run(ctx: unknown, opts: object): Promise<{ violations: AxeViolation[] }> }; document: unknown };
    const result = await page.axe.run(page.document, { resultTypes: ['violations'] });
    return result.violations;
  });
  return violations.filter((v) => v.impact === 'serious' || v.impact === 'critical');
}

interface Heading {
  level: number;
  text: string;
}

/** The visible headings in document order with their levels (h1–h6 or role=heading with aria-level). */
async function visibleHeadings(page: Page): Promise<Heading[]> {
  return page.evaluate(() => {
    type El = { tagName: string; textContent: string | null; getAttribute(n: string): string | null; closest(s: string): El | null; checkVisibility(o: object): boolean };
    const doc = (globalThis as unknown as { document: { querySelectorAll(s: string): ArrayLike<El> } }).document;
    const out: { level: number; text: string }[] = [];
    for (const el of Array.from(doc.querySelectorAll('h1,h2,h3,h4,h5,h6,[role=heading]'))) {
      if (!el.checkVisibility({ visibilityProperty: true })) continue;
      if (el.closest('[aria-hidden=true],[inert]')) continue;
      const aria = Number(el.getAttribute('aria-level'));
      const tag = /^H([1-6])$/.exec(el.tagName);
      // An explicit aria-level wins over the tag, as assistive tech reads it; role=heading alone is level 2 (WAI-ARIA 1.2).
      const level = aria > 0 ? aria : tag ? Number(tag[1]) : 2;
      out.push({ level, text: (el.textContent ?? '').trim().slice(0, 60) });
    }
    return out;
  });
}

/** Problems with the heading outline: not exactly one h1, or a level skipped on the way down. */
export function headingProblems(headings: Heading[]): string[] {
  const problems: string[] = [];
  const ones = headings.filter((h) => h.level === 1);
  if (ones.length !== 1) problems.push(`${ones.length} level-1 headings: ${ones.map((h) => `"${h.text}"`).join(', ')}`);
  let previous = 0;
  for (const h of headings) {
    if (h.level > previous + 1) problems.push(`"${h.text}" is level ${h.level} after level ${previous}`);
    previous = h.level;
  }
  return problems;
}

function describeViolations(violations: AxeViolation[]): string {
  return violations
    .map((v) => {
      const nodes = v.nodes.slice(0, 5).map((n) => `    ${n.target.join(' ')} :: ${n.html.slice(0, 160)}`);
      return `${v.impact} ${v.id} (${v.nodes.length}): ${v.help}\n${nodes.join('\n')}`;
    })
    .join('\n');
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  await seedAuditData();
});
afterAll(async () => {
  await browser?.close();
});

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('accessibility audit at the %s viewport', (viewport) => {
  it.each(AUDIT_SCREENS.map((s) => [s.name, s] as const))('when axe-core audits the %s screen, then it finds no serious or critical violation', async (_name, screen) => {
    // The app's CSP allows no inline script; the audit's context bypasses it to inject axe-core.
    const context = await browser.newContext({ viewport: VIEWPORTS[viewport], baseURL: inject('baseUrl'), deviceScaleFactor: 1, bypassCSP: true });
    const page = await context.newPage();
    await signInFor(page, screen.role);
    await screen.open(page);
    await saveShot(page, `a11y-${screen.name}-${viewport}`);
    const violations = await seriousViolations(page);
    if (violations.length) console.log(`[a11y ${screen.name} ${viewport}]\n${describeViolations(violations)}`);
    expect(violations.map((v) => `${v.impact} ${v.id} ×${v.nodes.length}`)).toEqual([]);
    // One h1 per screen, and headings that step down one level at a time (WCAG 1.3.1; common practice).
    const headings = await visibleHeadings(page);
    const problems = headingProblems(headings);
    if (problems.length) console.log(`[headings ${screen.name} ${viewport}]\n${headings.map((h) => `  h${h.level} ${h.text}`).join('\n')}`);
    expect(problems).toEqual([]);
    await page.context().close();
  });
});

interface DialogCase {
  who: string;
  role: 'tech' | 'admin';
  url: string;
  opener: string;
  dialog: string;
  title: string;
}

const DIALOGS: DialogCase[] = [
  { who: 'a tech opens Start over on the Check screen', role: 'tech', url: '/check', opener: 'check-reset', dialog: 'check-reset-dialog', title: 'Start over?' },
  { who: 'an admin opens Add user on the Users page', role: 'admin', url: '/admin/users', opener: 'add-user', dialog: 'add-user-dialog', title: 'Add user' },
];

describe('dialogs', () => {
  // Every dialog is the one AppDialog; each case proves it where a screen's own widgets could steal focus.
  it.each(DIALOGS.map((d) => [d.who, d] as const))('when %s, then focus moves into a named modal dialog, stays there on Tab, and returns to the button on Escape', async (_who, d) => {
    const context = await browser.newContext({ viewport: VIEWPORTS.wide, baseURL: inject('baseUrl'), deviceScaleFactor: 1 });
    const page = await context.newPage();
    await signInFor(page, d.role);
    await page.goto(d.url);
    const opener = page.getByTestId(d.opener);
    await expect.poll(() => opener.isVisible(), { timeout: 15_000 }).toBe(true);
    // A click focuses the button in Chromium, as a keyboard user's Enter would.
    await opener.click();

    const dialog = page.getByTestId(d.dialog);
    await expect.poll(() => dialog.count(), { timeout: 15_000 }).toBe(1);
    expect(await dialog.getAttribute('role')).toBe('dialog');
    expect(await dialog.getAttribute('aria-modal')).toBe('true');
    const titleId = await dialog.getAttribute('aria-labelledby');
    expect(await page.locator(`[id="${titleId}"]`).textContent()).toBe(d.title);
    const focusInDialog = () => page.evaluate(() => {
      const g = globalThis as unknown as { document: { activeElement: { closest(s: string): unknown } | null } };
      return Boolean(g.document.activeElement?.closest('[role=dialog]'));
    });
    await expect.poll(focusInDialog).toBe(true);
    // Focus stays in: a late focus grab by the page behind (a menu anchor, say) would show here.
    await page.waitForTimeout(1_000);
    expect(await focusInDialog()).toBe(true);
    // More Tabs than the dialog has controls: focus wraps inside it.
    for (let i = 0; i < 12; i++) await page.keyboard.press('Tab');
    expect(await focusInDialog()).toBe(true);
    for (let i = 0; i < 3; i++) await page.keyboard.press('Shift+Tab');
    expect(await focusInDialog()).toBe(true);

    await page.keyboard.press('Escape');
    await expect.poll(() => dialog.count()).toBe(0);
    await expect.poll(() => page.evaluate(() => (globalThis as unknown as { document: { activeElement: { getAttribute(n: string): string | null } | null } }).document.activeElement?.getAttribute('data-testid'))).toBe(d.opener);
    await context.close();
  });
});
