import { apiBlob } from '@/hooks/api-client';

/** Fetches a PDF with the session token and opens it in a new tab (a plain link would carry no token). */
export async function openPdf(path: string, fileName: string): Promise<void> {
  const blob = await apiBlob(path);
  const url = URL.createObjectURL(blob);
  const opened = typeof window !== 'undefined' ? window.open(url, '_blank') : null;
  if (!opened && typeof document !== 'undefined') {
    // Pop-ups blocked: download instead.
    const a = document.createElement('a');
    a.href = url;
    a.download = fileName;
    a.click();
  }
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}
