import { mkdirSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';

/** Full-page screenshots for looking at, written under $TMPDIR/shots (outside the repository). */
export async function saveShot(page: Page, name: string): Promise<void> {
  const dir = path.join(os.tmpdir(), 'shots');
  mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}
