/**
 * Native fallback: Tandem ships on the web target; a native build would keep the session in the
 * platform keychain. Until then the session lives for the process.
 */
let memory: string | null = null;

export function readStoredSession(): string | null {
  return memory;
}

export function writeStoredSession(value: string | null): void {
  memory = value;
}
