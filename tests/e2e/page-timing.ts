/**
 * In-page timing scripts, as source text (the Node-side TypeScript projects have no DOM types).
 * Times come from the page's own clock, so Playwright's round trips are not counted as the app's.
 */

/**
 * An expression that resolves with the ms from the next click reaching the page to the moment the
 * element `selector` holds a text different from its text before the click and containing `expected`
 * (Infinity after 10 s).
 */
export function tapToAnswerScript(selector: string, expected: string): string {
  return `new Promise((resolve) => {
    let tapped = 0;
    document.addEventListener('click', () => { tapped = performance.now(); }, { capture: true, once: true });
    const answer = () => document.querySelector(${JSON.stringify(selector)})?.textContent ?? '';
    const before = answer();
    const seen = () => answer() !== before && answer().includes(${JSON.stringify(expected)});
    setTimeout(() => resolve(Number.POSITIVE_INFINITY), 10000);
    const observer = new MutationObserver(() => {
      if (tapped && seen()) { observer.disconnect(); resolve(performance.now() - tapped); }
    });
    observer.observe(document.body, { subtree: true, childList: true, characterData: true });
  })`;
}

/** An init script that records in window.__shownAt the ms from navigation start until `selector` exists. */
export function shownAtScript(selector: string): string {
  return `new MutationObserver((_, observer) => {
    if (document.querySelector(${JSON.stringify(selector)})) { window.__shownAt = performance.now(); observer.disconnect(); }
  }).observe(document, { subtree: true, childList: true });`;
}

/** An expression that resolves true once a service worker is active for the page. */
export const SERVICE_WORKER_ACTIVE = 'navigator.serviceWorker.ready.then((r) => Boolean(r.active))';
