import { describe, expect, it } from 'vitest';
import { loadConfig } from '../../../server/env';

// A JWT secret so loadConfig does not write one to the data dir.
const base = { TANDEM_JWT_SECRET: 'x'.repeat(32), TANDEM_DATA_DIR: '/tmp/tandem-config-test' };

describe('SMTP settings in server/env.ts', () => {
  it('when no host is set, then sending is not configured and the local mail port defaults to 2525', () => {
    const config = loadConfig(base);
    expect(config.smtp).toBeUndefined();
    expect(config.localMailPort).toBe(2525);
  });

  it('when a host is set, then TLS mode picks the port (465 implicit TLS, 587 submission — RFC 8314, RFC 6409)', () => {
    expect(loadConfig({ ...base, SMTP_HOST: 'mail.example.test', SMTP_TLS: 'tls' }).smtp).toMatchObject({
      host: 'mail.example.test',
      port: 465,
      tls: 'tls',
    });
    expect(loadConfig({ ...base, SMTP_HOST: 'mail.example.test' }).smtp).toMatchObject({ port: 587, tls: 'starttls' });
    expect(
      loadConfig({
        ...base,
        SMTP_HOST: 'mail.example.test',
        SMTP_PORT: '2587',
        SMTP_USER: 'office',
        SMTP_PASSWORD: 'pw',
        SMTP_FROM: 'office@example.test',
      }).smtp,
    ).toMatchObject({
      port: 2587,
      user: 'office',
      password: 'pw',
      from: 'office@example.test',
    });
  });

  it('when settings are inconsistent or malformed, then loading the configuration fails with the reason', () => {
    expect(() => loadConfig({ ...base, SMTP_HOST: 'mail.example.test', SMTP_USER: 'office' })).toThrow(/SMTP_USER and SMTP_PASSWORD/);
    expect(() => loadConfig({ ...base, SMTP_USER: 'office', SMTP_PASSWORD: 'pw' })).toThrow(/SMTP_HOST/);
    expect(() => loadConfig({ ...base, SMTP_HOST: 'mail.example.test', SMTP_PORT: '70000' })).toThrow(/SMTP_PORT/);
    expect(() => loadConfig({ ...base, SMTP_HOST: 'mail.example.test', SMTP_TLS: 'maybe' })).toThrow(/SMTP_TLS/);
    expect(() => loadConfig({ ...base, SMTP_FROM: 'nobody' })).toThrow(/SMTP_FROM/);
  });
});
