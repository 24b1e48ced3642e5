/** How long after a send a second one asks first (the record report's rule). */
export const RESEND_ASK_MS = 60_000;

const lastSend = new Map<number, { to: string; at: number }>();

/** The last send of a job's proposal from this app if it was under a minute ago, else undefined. */
export function recentlySent(jobId: number, nowMs: number): { to: string; at: number } | undefined {
  const last = lastSend.get(jobId);
  return last && nowMs - last.at < RESEND_ASK_MS ? last : undefined;
}

export function rememberSent(jobId: number, to: string, atMs: number): void {
  lastSend.set(jobId, { to, at: atMs });
}
