import { createHash } from 'node:crypto';

/**
 * Photos decoded once per process for every report that shows them.
 *
 * pdfkit parses an image each time a document draws it (png-js copies a PNG's data byte by byte:
 * ~100 ms for a 640 × 480 photo). The parsed image does not depend on the document until it is
 * embedded, so one parsed copy per content hash is kept and each document gets a shallow clone with
 * its own label and no embedding yet. The kept copies are bounded by total bytes.
 */

interface ParsedImage {
  label: string;
  width: number;
  height: number;
  obj?: unknown;
}

interface ImageDoc {
  openImage(src: Buffer): ParsedImage;
  _imageCount: number;
}

const MAX_CACHED_BYTES = 48 * 1024 * 1024;
const parsed = new Map<string, { image: ParsedImage; bytes: number }>();
let cachedBytes = 0;

function remember(key: string, image: ParsedImage, bytes: number) {
  // Each parsed copy holds about twice its file: the bytes and the image data taken from them.
  const cost = bytes * 2;
  if (cost > MAX_CACHED_BYTES) return;
  while (cachedBytes + cost > MAX_CACHED_BYTES && parsed.size > 0) {
    const [oldest, entry] = parsed.entries().next().value as [string, { bytes: number }];
    parsed.delete(oldest);
    cachedBytes -= entry.bytes;
  }
  parsed.set(key, { image, bytes: cost });
  cachedBytes += cost;
}

/** An image object for `doc.image()`: parsed once per content, fresh (unembedded, own label) for this document. */
export function reusableImage(doc: PDFKit.PDFDocument, data: Buffer): ParsedImage {
  const pdf = doc as unknown as ImageDoc;
  const key = createHash('sha1').update(data).digest('hex');
  let entry = parsed.get(key);
  if (!entry) {
    // Parsed through this document (throws for unreadable bytes, which the caller draws as a frame);
    // the parsed copy itself is never embedded, only its clones.
    const image = pdf.openImage(data);
    remember(key, image, data.length);
    entry = { image, bytes: 0 };
  }
  const clone = Object.assign(Object.create(Object.getPrototypeOf(entry.image) as object) as ParsedImage, entry.image);
  clone.label = `I${++pdf._imageCount}`;
  clone.obj = null;
  return clone;
}

/** Draws a photo with `doc.image()` through the per-process cache; answers the label it was given in this document. */
export function drawCachedImage(doc: PDFKit.PDFDocument, data: Buffer, x: number, y: number, options: PDFKit.Mixins.ImageOption): string {
  const image = reusableImage(doc, data);
  // pdfkit draws an already opened image object (it checks for width and height); its types only list sources.
  doc.image(image as unknown as Buffer, x, y, options);
  return image.label;
}
