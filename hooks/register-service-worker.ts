/** Native builds have no service worker: the web variant (register-service-worker.web.ts) does the work. */
export function registerServiceWorker(): void {}
