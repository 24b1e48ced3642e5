import nodemailer from 'nodemailer';
import type { SmtpConfig } from './smtp-config';

/** A nodemailer SMTP transport for the settings, with short timeouts so a dead host fails fast. */
export function createMailTransport(smtp: SmtpConfig) {
  return nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.tls === 'tls',
    requireTLS: smtp.tls === 'starttls',
    ignoreTLS: smtp.tls === 'none',
    auth: smtp.user ? { user: smtp.user, pass: smtp.password } : undefined,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 30_000,
  });
}
