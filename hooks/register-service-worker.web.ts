/** How long after the page has loaded the worker is registered (ms). */
const REGISTER_DELAY_MS = 3000;

/**
 * Registers dist/sw.js (generated at build time by scripts/service-worker.mjs) so the app opens with
 * no signal after one visit. Production exports only: the dev server has no sw.js, and a worker
 * caching dev bundles would serve stale code.
 */
export function registerServiceWorker(): void {
  if (process.env.NODE_ENV !== 'production') return;
  if (typeof navigator === 'undefined' || !('serviceWorker' in navigator)) return;
  const register = () => {
    navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch(() => {
      // No worker (plain HTTP on a LAN host other than localhost, private mode): the app works online as before.
    });
  };
  // Well after load: precaching ~5 MB must not compete with the first screen for the phone's CPU and signal.
  const later = () => setTimeout(register, REGISTER_DELAY_MS);
  if (document.readyState === 'complete') later();
  else window.addEventListener('load', later, { once: true });
}
