import { describe, expect, it } from 'vitest';
import { isConnected, nextConnection, shouldProbe, type ConnectionState } from '../../hooks/connection-state';

const up: ConnectionState = { browserOnline: true, serverReachable: true };

describe('connection state', () => {
  it('when the browser reports no network, then the app is offline and does not probe', () => {
    const s = nextConnection(up, 'browser-offline');
    expect(isConnected(s)).toBe(false);
    expect(shouldProbe(s)).toBe(false);
  });

  it('when a request fails while the browser says online, then the app is offline and probes the server', () => {
    const s = nextConnection(up, 'request-failed');
    expect(isConnected(s)).toBe(false);
    expect(shouldProbe(s)).toBe(true);
  });

  it('when a request answers after a failure, then the app is online again and stops probing', () => {
    const s = nextConnection(nextConnection(up, 'request-failed'), 'request-ok');
    expect(isConnected(s)).toBe(true);
    expect(shouldProbe(s)).toBe(false);
  });

  it('when the browser comes back online after both signals were down, then it trusts the network again', () => {
    const down = nextConnection(nextConnection(up, 'request-failed'), 'browser-offline');
    expect(isConnected(down)).toBe(false);
    expect(isConnected(nextConnection(down, 'browser-online'))).toBe(true);
  });

  it('when the browser is offline and a request fails, then coming back online alone is what ends it', () => {
    const s = nextConnection(nextConnection(up, 'browser-offline'), 'request-failed');
    expect(isConnected(s)).toBe(false);
    expect(shouldProbe(s)).toBe(false);
  });
});
