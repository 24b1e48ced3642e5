import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, openPage } from './browser';
import { FIRST_SCREEN_FACES, textFontFamilies } from '../../scripts/service-worker.mjs';
import { shownAtScript } from './page-timing';

/**
 * The web export is split per screen (app.json asyncRoutes, DEVELOPERS.md footgun 38). A cold visit to the
 * sign-in screen must not wait for other screens' code, must still validate (zod arrives after the form,
 * footgun 39), and must fetch every screen's code once it is idle, so a screen first opened with no signal works.
 */

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const chunkName = (url: string) => url.match(/\/_expo\/static\/js\/web\/(.+)-[0-9a-f]{32}\.js$/)?.[1];
const SIGNED_IN_CHUNKS = ['[jobId]', 'imports', 'pricing', 'users', 'rules'];

/** Chunks the page has requested, each with when its request started (the page's clock). */
async function chunkRequests(page: import('playwright-core').Page): Promise<{ name: string; startMs: number }[]> {
  const entries = await page.evaluate<{ name: string; startTime: number }[]>(
    'performance.getEntriesByType("resource").map((e) => ({ name: e.name, startTime: e.startTime }))',
  );
  return entries.flatMap((e) => {
    const name = chunkName(e.name);
    return name ? [{ name, startMs: e.startTime }] : [];
  });
}

describe('web boot on a phone', () => {
  it('when the sign-in screen opens cold, then only its own chunks load before the form, the form validates, and the other screens load after it', async () => {
    const page = await openPage(browser, 'phone');
    // Stamps in the page when the e-mail field lands, so "before the form" does not depend on Playwright's polling.
    await page.addInitScript(shownAtScript('[data-testid="sign-in-email"]'));
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-email').waitFor({ timeout: 30_000 });
    let shownAt: number | undefined;
    await expect.poll(async () => (shownAt = await page.evaluate<number | undefined>('window.__shownAt'))).toBeGreaterThan(0);

    // Every text face the sign-in screen sets text in was preloaded from index.html (the others are not, so that
    // they are not decoded before the bundle runs: scripts/service-worker.mjs, FIRST_SCREEN_FACES).
    const usedFamilies = await page.evaluate<string[]>('[...document.fonts].filter((f) => f.status !== "unloaded").map((f) => f.family)');
    const stems = new Map(textFontFamilies());
    const used = usedFamilies.map((family) => stems.get(family.replace(/"/g, '')));
    expect(used.length).toBeGreaterThan(0);
    for (const stem of used) expect(FIRST_SCREEN_FACES).toContain(stem);

    // Typing works and the shared schema validates on the phone: the message is SignInSchema's (shared/schemas/auth.ts).
    await page.getByTestId('sign-in-email').fill('not-an-address');
    await page.getByTestId('sign-in-submit').click();
    await expect.poll(() => page.getByText('Enter a valid e-mail address.').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('sign-in-error').count()).toBe(0);

    // Once idle, the signed-in screens' chunks are fetched too (hooks/preload-routes.web.ts), all after the form.
    let requestsNow: { name: string; startMs: number }[] = [];
    await expect
      .poll(async () => {
        requestsNow = await chunkRequests(page);
        return SIGNED_IN_CHUNKS.every((name) => requestsNow.some((r) => r.name === name));
      }, { timeout: 20_000 })
      .toBe(true);
    const beforeForm = requestsNow.filter((r) => r.startMs < shownAt!).map((r) => r.name);
    expect(beforeForm).toEqual(expect.arrayContaining(['entry', 'sign-in']));
    for (const name of SIGNED_IN_CHUNKS) expect(beforeForm).not.toContain(name);
    await page.context().close();
  });
});
