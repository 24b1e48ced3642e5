import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { account, launchBrowser, openPage, screenshot, signIn } from './browser';

/**
 * Issue 8 in the browser: a price file written with decimal commas says so on the preview, and its
 * rejected rows are paged from the server. Models and distributors are invented and unique to this file.
 */

// 3 valid rows with decimal commas (de-DE style, CLDR), then 60 rows whose price is no number: lines 5-64.
const LINES = ['model;price', 'ZQPG-1;12,50', 'ZQPG-2;"1.234,50"', 'ZQPG-3;7,00', ...Array.from({ length: 60 }, (_, i) => `ZQPG-B${i};ask us`)];

async function chooseFile(page: Page, name: string, csv: string) {
  const chooser = page.waitForEvent('filechooser');
  await page.getByTestId('import-pick').click();
  await (await chooser).setFiles({ name, mimeType: 'text/csv', buffer: Buffer.from(csv, 'utf8') });
  await expect.poll(() => page.getByTestId('import-file-name').textContent()).toContain(name);
}

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('price preview: decimal mark and paged rejected rows', () => {
  for (const viewport of ['wide', 'phone'] as const) {
    it(`when an admin (${viewport}) uploads a decimal-comma file with 60 bad rows, then the preview names the decimal comma and pages the rejected rows`, async () => {
      const page = await openPage(browser, viewport);
      await signIn(page, account('admin'));
      await page.goto('/admin/imports');
      await page.getByTestId('import-kind-prices').click();
      await page.getByTestId('import-distributor').fill(`Paging Supply E2E ${viewport}`);
      await chooseFile(page, 'paging.csv', LINES.join('\n'));
      await page.getByTestId('import-upload').click();
      await expect.poll(() => page.getByTestId('import-preview').isVisible(), { timeout: 20_000 }).toBe(true);
      expect(await page.getByTestId('import-decimal').textContent()).toContain('decimal comma');
      expect(await page.getByTestId('import-counts-rejected').textContent()).toContain('60');
      // 60 problems at 50 a page: two pages, line 5 first, line 55 first on page 2.
      await expect.poll(() => page.getByTestId('rejected-page').textContent(), { timeout: 15_000 }).toBe('Page 1 of 2');
      expect(await page.getByTestId('rejected-row-5').textContent()).toContain('ask us');
      await screenshot(page, `import-decimal-${viewport}`);
      await page.getByTestId('rejected-next').click();
      await expect.poll(() => page.getByTestId('rejected-page').textContent()).toBe('Page 2 of 2');
      await expect.poll(() => page.getByTestId('rejected-row-55').isVisible(), { timeout: 15_000 }).toBe(true);
      expect(await page.locator('[data-testid^="rejected-row-"]').count()).toBe(10);
      await page.getByTestId('rejected-next').scrollIntoViewIfNeeded();
      await screenshot(page, `import-errors-page2-${viewport}`);
      await page.context().close();
    });
  }
});
