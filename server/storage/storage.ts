/**
 * The one interface stored files go through (photos, sent reports). Keys are opaque and made by the
 * store itself — never a user-supplied or guessable path — so a local disk and an S3-compatible
 * object store can back it alike (DESIGN.md §9).
 */
export interface FileStorage {
  /** Stores the bytes under a new random key and returns the key. */
  put(data: Buffer): Promise<string>;
  /** The bytes under a key; null when there is none. */
  get(key: string): Promise<Buffer | null>;
  delete(key: string): Promise<void>;
}

/** Keys are 32 lowercase hex characters (128 random bits). */
export const STORAGE_KEY_PATTERN = /^[0-9a-f]{32}$/;
