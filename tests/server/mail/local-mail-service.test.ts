import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { startLocalMailService } from '../../../server/mail/local-mail-service';

describe('the local mail service', () => {
  it('when its port is taken by another demo, then it listens on another loopback port', async () => {
    const dir = mkdtempSync(path.join(os.tmpdir(), 'tandem-mail-'));
    const first = await startLocalMailService({ dataDir: dir, port: 0 });
    try {
      const second = await startLocalMailService({ dataDir: dir, port: first.smtp.port });
      expect(second.smtp.port).not.toBe(first.smtp.port);
      expect(second.smtp.host).toBe('127.0.0.1');
      await second.close();
    } finally {
      await first.close();
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
