import type { RouteNode } from 'expo-router/build/Route';
import { store } from 'expo-router/build/global-state/router-store';

/**
 * Web: the export splits the app into one chunk per screen (app.json, asyncRoutes "production"), so a screen's
 * code arrives when the screen first opens. A screen first opened with no signal, before the service worker
 * has precached the chunks, would have no code. Once the first screen is up and the browser is idle, this
 * fetches every screen's chunk (loading a lazy route returns a promise; nothing renders).
 */
export function preloadRoutes(node: RouteNode | null = store.routeNode): void {
  for (const child of node?.children ?? []) {
    try {
      const loaded = child.loadRoute?.() as unknown;
      if (loaded instanceof Promise) loaded.catch(() => undefined);
    } catch {
      // A chunk that fails now is fetched again when its screen opens.
    }
    preloadRoutes(child);
  }
}
