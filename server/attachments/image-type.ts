import { fileTypeFromBuffer } from 'file-type';

/** The photo types a phone sends that we keep (checked from the bytes, never the name or header). */
const ACCEPTED = new Map([
  ['image/jpeg', 'jpg'],
  ['image/png', 'png'],
  ['image/webp', 'webp'],
  ['image/heic', 'heic'],
  ['image/heif', 'heic'],
]);

/** The image type of the bytes (`image/jpeg`…) with its usual extension, or null when not an accepted photo. */
export async function detectImageType(data: Buffer): Promise<{ mime: string; ext: string } | null> {
  const found = await fileTypeFromBuffer(data);
  if (!found) return null;
  const ext = ACCEPTED.get(found.mime);
  return ext ? { mime: found.mime === 'image/heif' ? 'image/heic' : found.mime, ext } : null;
}
