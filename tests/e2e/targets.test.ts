import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MIN_TARGET_PX } from '../../constants/target-size';
import { launchBrowser, openPage, VIEWPORTS, type ViewportName } from './browser';
import { AUDIT_SCREENS, seedAuditData, signInFor } from './audit-screens';
import { saveShot } from './shots';

/**
 * Every interactive element on every screen, at both viewports, is at least 48×48 CSS px: a gloved
 * thumb's target (WCAG 2.2 SC 2.5.5 Target Size (Enhanced) asks 44 px; Material's guidance is 48 dp).
 */

const INTERACTIVE = [
  'button',
  'a[href]',
  'input:not([type=hidden])',
  'select',
  'textarea',
  '[role=button]',
  '[role=link]',
  '[role=switch]',
  '[role=checkbox]',
  '[role=radio]',
  '[role=tab]',
  '[role=menuitem]',
  '[role=option]',
].join(',');

interface Small {
  what: string;
  widthPx: number;
  heightPx: number;
}

/** The few DOM members the measurement uses (the server tsconfig these tests compile under has no DOM lib). */
interface El {
  tagName: string;
  textContent: string | null;
  getAttribute(name: string): string | null;
  closest(selector: string): El | null;
  checkVisibility(options: object): boolean;
  getBoundingClientRect(): { width: number; height: number };
}
type Doc = { querySelectorAll(selector: string): ArrayLike<El> };

async function smallTargets(page: Page, minPx: number, selector: string): Promise<Small[]> {
  return page.evaluate(
    ({ minPx, selector }) => {
      const out: { what: string; widthPx: number; heightPx: number }[] = [];
      const doc = (globalThis as unknown as { document: Doc }).document;
      for (const el of Array.from(doc.querySelectorAll(selector))) {
        // Only what a finger can reach: rendered, not hidden from everyone, not inert.
        if (!el.checkVisibility({ visibilityProperty: true, opacityProperty: true })) continue;
        if (el.closest('[aria-hidden=true],[inert]')) continue;
        const box = el.getBoundingClientRect();
        if (box.width === 0 && box.height === 0) continue;
        // Rounded to a tenth of a pixel: sub-pixel layout is not a miss.
        const w = Math.round(box.width * 10) / 10;
        const h = Math.round(box.height * 10) / 10;
        if (w + 0.5 < minPx || h + 0.5 < minPx) {
          const name = el.getAttribute('aria-label') ?? el.textContent?.trim().slice(0, 40) ?? '';
          const id = el.getAttribute('data-testid');
          out.push({ what: `${el.tagName.toLowerCase()}[role=${el.getAttribute('role') ?? ''}] "${name}"${id ? ` #${id}` : ''}`, widthPx: w, heightPx: h });
        }
      }
      return out;
    },
    { minPx, selector },
  );
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
  await seedAuditData();
});
afterAll(async () => {
  await browser?.close();
});

describe.each(Object.keys(VIEWPORTS) as ViewportName[])('target sizes at the %s viewport', (viewport) => {
  it.each(AUDIT_SCREENS.map((s) => [s.name, s] as const))('when the %s screen is measured, then every interactive element is at least 48×48 px', async (_name, screen) => {
    const page = await openPage(browser, viewport);
    await signInFor(page, screen.role);
    await screen.open(page);
    await saveShot(page, `targets-${screen.name}-${viewport}`);
    const small = await smallTargets(page, MIN_TARGET_PX, INTERACTIVE);
    if (small.length) console.log(`[targets ${screen.name} ${viewport}]\n${small.map((s) => `  ${s.widthPx}×${s.heightPx} ${s.what}`).join('\n')}`);
    expect(small.map((s) => `${s.what} ${s.widthPx}×${s.heightPx}`)).toEqual([]);
    await page.context().close();
  });
});
