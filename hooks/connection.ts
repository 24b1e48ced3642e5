import { onlineManager } from '@tanstack/react-query';
import { onRequestOutcome, pingServer } from './api-client';
import { isConnected, nextConnection, shouldProbe, type ConnectionEvent, type ConnectionState } from './connection-state';

/** How often to ask the server whether it is back, while the network is up but requests fail (ms). */
const PROBE_INTERVAL_MS = 15_000;

let state: ConnectionState = { browserOnline: true, serverReachable: true };
let probe: ReturnType<typeof setInterval> | null = null;
let installed = false;

function apply(event: ConnectionEvent, setOnline: (online: boolean) => void) {
  state = nextConnection(state, event);
  setOnline(isConnected(state));
  if (shouldProbe(state) && !probe) {
    probe = setInterval(() => {
      void pingServer().then((ok) => ok && apply('request-ok', setOnline));
    }, PROBE_INTERVAL_MS);
  } else if (!shouldProbe(state) && probe) {
    clearInterval(probe);
    probe = null;
  }
}

/**
 * Makes react-query's onlineManager follow the browser's events AND failed requests, so queries pause
 * (never spin) with no signal and resume when it returns. Called once, with the QueryClient.
 */
export function installConnectionTracking(): void {
  if (installed) return;
  installed = true;
  onlineManager.setEventListener((setOnline) => {
    const hasWindow = typeof window !== 'undefined' && typeof window.addEventListener === 'function';
    if (typeof navigator !== 'undefined' && navigator.onLine === false) apply('browser-offline', setOnline);
    else setOnline(isConnected(state));
    const online = () => apply('browser-online', setOnline);
    const offline = () => apply('browser-offline', setOnline);
    onRequestOutcome((ok) => {
      if (ok && isConnected(state)) return;
      apply(ok ? 'request-ok' : 'request-failed', setOnline);
    });
    if (hasWindow) {
      window.addEventListener('online', online);
      window.addEventListener('offline', offline);
    }
    return () => {
      if (hasWindow) {
        window.removeEventListener('online', online);
        window.removeEventListener('offline', offline);
      }
    };
  });
}
