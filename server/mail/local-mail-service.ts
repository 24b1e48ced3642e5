import { randomBytes } from 'node:crypto';
import { createWriteStream } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { SMTPServer } from 'smtp-server';
import { DEFAULT_FROM, type SmtpConfig } from './smtp-config';

export interface LocalMailService {
  /** SMTP settings that reach this service. */
  smtp: SmtpConfig;
  /** Folder holding one .eml file per message (attachments included, as sent). */
  dir: string;
  close(): Promise<void>;
}

/** 25 MB: a report with photos fits many times over. */
const MAX_MESSAGE_BYTES = 25 * 1024 * 1024;

/**
 * Demo mode's mail service: an SMTP server on the loopback interface that keeps every message it
 * receives as an .eml file under the data dir, so a sent report can be opened without a real mail host.
 */
export async function startLocalMailService(options: {
  dataDir: string;
  port: number;
  from?: string;
  onError?: (err: Error) => void;
}): Promise<LocalMailService> {
  const dir = path.join(options.dataDir, 'mail');
  await mkdir(dir, { recursive: true });
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: MAX_MESSAGE_BYTES,
    banner: 'Tandem local mail service',
    logger: false,
    onData(stream, _session, callback) {
      const id = `${new Date().toISOString().replace(/[:.]/g, '-')}-${randomBytes(6).toString('hex')}`;
      pipeline(stream, createWriteStream(path.join(dir, `${id}.eml`), { mode: 0o600 })).then(
        () => (stream.sizeExceeded ? callback(new Error('Message too large')) : callback(null, `kept as ${id}`)),
        (err: Error) => callback(err),
      );
    },
  });
  const listen = (port: number) =>
    new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        server.off('error', reject);
        resolve();
      });
    });
  try {
    await listen(options.port);
  } catch (err) {
    // Another demo on this machine holds the port: any free loopback port serves as well.
    if ((err as NodeJS.ErrnoException).code !== 'EADDRINUSE' || options.port === 0) throw err;
    await listen(0);
  }
  // A client that drops mid-message is an error event: report it, never let it end the process.
  server.on('error', (err: Error) => options.onError?.(err));
  const { port } = server.server.address() as AddressInfo;
  return {
    smtp: { host: '127.0.0.1', port, tls: 'none', from: options.from ?? DEFAULT_FROM },
    dir,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
