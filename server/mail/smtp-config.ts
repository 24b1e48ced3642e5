import { z } from 'zod';

/** SMTP settings as read from the environment (validated in server/env.ts, the one reader of process.env). */
export const SmtpEnvShape = {
  SMTP_HOST: z.string().trim().min(1).max(253).optional(),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).optional(),
  SMTP_USER: z.string().min(1).max(254).optional(),
  SMTP_PASSWORD: z.string().min(1).max(1024).optional(),
  /** `tls`: TLS from the first byte (port 465); `starttls`: upgrade required; `none`: plain (a local relay only). */
  SMTP_TLS: z.enum(['tls', 'starttls', 'none']).default('starttls'),
  SMTP_FROM: z.email().optional(),
  TANDEM_LOCAL_MAIL_PORT: z.coerce.number().int().min(0).max(65535).default(2525),
};

export interface SmtpConfig {
  host: string;
  port: number;
  tls: 'tls' | 'starttls' | 'none';
  user?: string;
  password?: string;
  from: string;
}

type SmtpEnv = z.infer<z.ZodObject<typeof SmtpEnvShape>>;

/** The SMTP settings, or undefined when no host is set; a user without a password is a configuration error. */
export function smtpConfigOf(e: SmtpEnv): SmtpConfig | undefined {
  if ((e.SMTP_USER === undefined) !== (e.SMTP_PASSWORD === undefined)) {
    throw new Error('Invalid configuration: SMTP_USER and SMTP_PASSWORD go together');
  }
  if (!e.SMTP_HOST) {
    if (e.SMTP_USER) throw new Error('Invalid configuration: SMTP_USER is set but SMTP_HOST is not');
    return undefined;
  }
  return {
    host: e.SMTP_HOST,
    port: e.SMTP_PORT ?? (e.SMTP_TLS === 'tls' ? 465 : 587),
    tls: e.SMTP_TLS,
    user: e.SMTP_USER,
    password: e.SMTP_PASSWORD,
    from: e.SMTP_FROM ?? DEFAULT_FROM,
  };
}

/** The sender address when the configuration gives none (a reserved .invalid domain, never a real one). */
export const DEFAULT_FROM = 'reports@tandem.invalid';
