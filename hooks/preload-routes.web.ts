import type { RouteNode } from 'expo-router/build/Route';
import { store } from 'expo-router/build/global-state/router-store';

/**
 * Web: the export splits the app into one chunk per screen (app.json, asyncRoutes "production"), so a screen's
 * code arrives when the screen first opens. A screen first opened with no signal, before the service worker
 * has precached the chunks, would have no code. Once the first screen is up and the browser is idle, this
 * fetches every screen's chunk (loading a lazy route returns a promise; nothing renders). Call it from a
 * screen, not from a layout: a layout's effect runs while its screen's own chunk is still on the way, and the
 * browser is idle then, so the other screens would compete with it (tests/e2e/web-boot.test.ts saw that).
 */
let started = false;
export function preloadRoutes(): void {
  if (started) return;
  started = true;
  preloadChildren(store.routeNode);
}

function preloadChildren(node: RouteNode | null): void {
  for (const child of node?.children ?? []) {
    try {
      const loaded = child.loadRoute?.() as unknown;
      if (loaded instanceof Promise) loaded.catch(() => undefined);
    } catch {
      // A chunk that fails now is fetched again when its screen opens.
    }
    preloadChildren(child);
  }
}
