/** The session token on the web: localStorage, so a reload keeps the tech signed in. */
const KEY = 'tandem.session';

export function readStoredSession(): string | null {
  try {
    return globalThis.localStorage?.getItem(KEY) ?? null;
  } catch {
    return null;
  }
}

export function writeStoredSession(value: string | null): void {
  try {
    if (value === null) globalThis.localStorage?.removeItem(KEY);
    else globalThis.localStorage?.setItem(KEY, value);
  } catch {
    // Private mode or storage full: the session simply lasts until the tab closes.
  }
}
