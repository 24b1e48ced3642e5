import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await createTestApp();
  // A miniature web export: what scripts/build-web.mjs leaves in dist/.
  const web = t.ctx.config.webDir;
  mkdirSync(path.join(web, '_expo/static/js/web'), { recursive: true });
  writeFileSync(path.join(web, 'index.html'), '<!DOCTYPE html><html><head></head><body><div id="root"></div></body></html>');
  writeFileSync(path.join(web, 'sw.js'), 'self.addEventListener("fetch", () => {});');
  writeFileSync(path.join(web, 'manifest.webmanifest'), JSON.stringify({ name: 'Tandem', start_url: '/' }));
  writeFileSync(path.join(web, '_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js'), 'console.log(1);');
});
afterAll(() => t.close());

describe('serving the installable web app', () => {
  it('when the browser checks for a new service worker, then sw.js is served as script and must be revalidated', async () => {
    const res = await request(t.app).get('/sw.js');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/javascript/);
    expect(res.headers['cache-control']).toBe('no-cache');
  });

  it('when the manifest, index.html or a deep link is fetched, then each must be revalidated too', async () => {
    for (const url of ['/manifest.webmanifest', '/index.html', '/check']) {
      const res = await request(t.app).get(url);
      expect(res.status, url).toBe(200);
      expect(res.headers['cache-control'], url).toBe('no-cache');
    }
    expect((await request(t.app).get('/manifest.webmanifest')).headers['content-type']).toMatch(/manifest\+json/);
  });

  it('when a hashed bundle is fetched, then it keeps its ordinary cache lifetime', async () => {
    const res = await request(t.app).get('/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js');
    expect(res.status).toBe(200);
    expect(res.headers['cache-control']).toMatch(/max-age=3600/);
  });

  it('when an unknown API path is fetched, then it stays a JSON 404 and never the app', async () => {
    const res = await request(t.app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
  });
});
