import pg from 'pg';
import type { DataSource } from 'typeorm';
import type { ChangeWatch } from './dialect';

/** The channel the change-notify triggers (migration 1765400000000) send on, at commit. */
export const CHANGE_CHANNEL = 'tandem_changes';
const RECONNECT_MS = 1_000;
const ECHO_TIMEOUT_MS = 1_000;

/**
 * One dedicated connection per instance that LISTENs for the triggers' NOTIFY: every notification
 * moves the generation, which is the stamp. PostgreSQL sends a notification only when its transaction
 * commits, so a cache keyed on the generation never holds a value older than the last commit heard of.
 * Until LISTEN is in place, and whenever the connection is lost, the stamp is null: callers read
 * through to the database on every request until it is back (and a reconnect moves the generation,
 * because notifications sent meanwhile were missed).
 */
export class PostgresChangeListener implements ChangeWatch {
  private generation = 0;
  private listening = false;
  private closed = false;
  private client: pg.Client | undefined;
  private waiters = new Set<() => void>();
  private tick: Promise<void> | undefined;

  constructor(private readonly config: pg.ClientConfig) {
    void this.connect();
  }

  stamp(): number | null {
    return this.listening ? this.generation : null;
  }

  /**
   * One turn of the event loop, shared by every request in it: a notification that reached this
   * process together with a request (the same poll) is taken in before the request trusts a cache.
   */
  settle(): Promise<void> {
    return (this.tick ??= new Promise((resolve) => setImmediate(() => {
      this.tick = undefined;
      resolve();
    })));
  }

  /** After this instance committed a watched change: wait until a notification comes back, so other instances (signalled at the same commit) have most likely heard it too. */
  echo(): Promise<void> {
    if (!this.listening) return Promise.resolve();
    return new Promise((resolve) => {
      const done = () => {
        clearTimeout(timer);
        this.waiters.delete(done);
        resolve();
      };
      const timer = setTimeout(done, ECHO_TIMEOUT_MS);
      timer.unref();
      this.waiters.add(done);
    });
  }

  async close(): Promise<void> {
    this.closed = true;
    this.listening = false;
    const client = this.client;
    this.client = undefined;
    this.changed();
    await client?.end().catch(() => undefined);
  }

  private async connect(): Promise<void> {
    if (this.closed) return;
    const client = new pg.Client(this.config);
    this.client = client;
    client.on('error', () => this.lost(client));
    client.on('end', () => this.lost(client));
    client.on('notification', () => this.changed());
    try {
      await client.connect();
      // The process must not stay alive for this connection alone (tasks, tests).
      (client as unknown as { connection?: { stream?: { unref?(): void } } }).connection?.stream?.unref?.();
      await client.query(`LISTEN ${CHANGE_CHANNEL}`);
      if (this.client !== client) return;
      this.changed();
      this.listening = true;
    } catch {
      this.lost(client);
    }
  }

  private lost(client: pg.Client): void {
    if (this.client !== client) return;
    this.client = undefined;
    this.listening = false;
    this.changed();
    client.end().catch(() => undefined);
    if (!this.closed) setTimeout(() => void this.connect(), RECONNECT_MS).unref();
  }

  private changed(): void {
    this.generation++;
    for (const wake of [...this.waiters]) wake();
  }
}

/** The listener's connection settings: the same server, database and credentials as the data source. */
export function listenerConfig(dataSource: DataSource): pg.ClientConfig {
  const o = dataSource.options as { url?: string; host?: string; port?: number; username?: string; password?: string; database?: string; ssl?: pg.ClientConfig['ssl'] };
  return { connectionString: o.url, host: o.host, port: o.port, user: o.username, password: o.password, database: o.database, ssl: o.ssl };
}
