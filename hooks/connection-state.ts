/**
 * Whether the app can reach the Tandem server, from two signals: the browser's online/offline
 * events (no network at all) and the outcome of real requests (a network that goes nowhere, as on a
 * driveway with one bar). Pure, so the rules are unit-tested in tests/app.
 */
export interface ConnectionState {
  /** The browser reports a network (navigator.onLine and its events). */
  browserOnline: boolean;
  /** The last request reached the server (any HTTP answer counts, even an error status). */
  serverReachable: boolean;
}

export type ConnectionEvent = 'browser-online' | 'browser-offline' | 'request-ok' | 'request-failed';

/** The state after one event. Coming back online trusts the network until a request says otherwise. */
export function nextConnection(state: ConnectionState, event: ConnectionEvent): ConnectionState {
  switch (event) {
    case 'browser-online':
      return { browserOnline: true, serverReachable: true };
    case 'browser-offline':
      return { ...state, browserOnline: false };
    case 'request-ok':
      // A response proves the network is there, whatever the browser last said.
      return { browserOnline: true, serverReachable: true };
    case 'request-failed':
      return { ...state, serverReachable: false };
  }
}

/** True when requests to the server can be expected to succeed. */
export function isConnected(state: ConnectionState): boolean {
  return state.browserOnline && state.serverReachable;
}

/** True when the browser has a network but the server did not answer: worth probing now and then. */
export function shouldProbe(state: ConnectionState): boolean {
  return state.browserOnline && !state.serverReachable;
}
