/**
 * Runs `work` once the browser is idle (at the latest after `timeoutMs`), or after a tick where there is no
 * idle callback (Safari, native). Returns a cancel function, so it can be an effect's body.
 */
export function whenIdle(work: () => void, timeoutMs = 2000): () => void {
  const idle = (globalThis as { requestIdleCallback?: (cb: () => void, opts: { timeout: number }) => number }).requestIdleCallback;
  if (idle) {
    const id = idle(work, { timeout: timeoutMs });
    return () => (globalThis as unknown as { cancelIdleCallback: (id: number) => void }).cancelIdleCallback(id);
  }
  const id = setTimeout(work, 0);
  return () => clearTimeout(id);
}
