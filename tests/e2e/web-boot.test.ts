import type { Browser, Request } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, openPage } from './browser';

/**
 * The web export is split per screen (app.json asyncRoutes, DEVELOPERS.md footgun 37). A cold visit to the
 * sign-in screen must not wait for other screens' code, must still validate (zod arrives after the form,
 * footgun 38), and must fetch every screen's code once it is idle, so a screen first opened with no signal works.
 */

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

const chunkName = (url: string) => url.match(/\/_expo\/static\/js\/web\/(.+)-[0-9a-f]{32}\.js$/)?.[1];

describe('web boot on a phone', () => {
  it('when the sign-in screen opens cold, then only its own chunks load before the form, the form validates, and the other screens load after it', async () => {
    const page = await openPage(browser, 'phone');
    const requested: string[] = [];
    page.on('request', (req: Request) => {
      const name = chunkName(req.url());
      if (name) requested.push(name);
    });
    await page.goto('/sign-in');
    await page.getByTestId('sign-in-email').waitFor({ timeout: 30_000 });
    const beforeForm = [...requested];
    // The boot scripts of index.html plus the root layout and the sign-in route; no signed-in screen.
    expect(beforeForm).toEqual(expect.arrayContaining(['entry', 'sign-in']));
    for (const name of ['[jobId]', 'imports', 'pricing', 'users', 'rules']) expect(beforeForm).not.toContain(name);

    // Typing works and the shared schema validates on the phone: the message is SignInSchema's (shared/schemas/auth.ts).
    await page.getByTestId('sign-in-email').fill('not-an-address');
    await page.getByTestId('sign-in-submit').click();
    await expect.poll(() => page.getByText('Enter a valid e-mail address.').count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByTestId('sign-in-error').count()).toBe(0);

    // Once idle, the signed-in screens' chunks are fetched too (hooks/preload-routes.web.ts).
    await expect.poll(() => ['[jobId]', 'imports', 'pricing', 'users', 'rules'].every((name) => requested.includes(name)), { timeout: 20_000 }).toBe(true);
    await page.context().close();
  });
});
