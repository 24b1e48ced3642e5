// Draws Tandem's app icons (two linked copper rings on the app's night-service blue) into
// public/icons/*.png with no image library: a few distance tests per pixel, 4×4 supersampled, and a
// hand-written PNG encoder. Run once after changing the design: node scripts/make-icons.mjs
import { mkdirSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { Buffer } from 'node:buffer';
import { crc32, deflateSync } from 'node:zlib';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const outDir = path.join(root, 'public', 'icons');

// constants/theme.ts: primary (background) and a lighter copper than `secondary` so the rings read on blue.
const BLUE = [0x23, 0x40, 0x6e];
const COPPER = [0xe0, 0x8a, 0x4f];
const WHITE = [0xff, 0xff, 0xff];

/** Colour (or null for transparent) at a point in unit coordinates (0..1), for a given icon style. */
function sample(x, y, { maskable }) {
  // The "any" icon is a rounded square; a maskable icon fills the square (the platform cuts its own shape).
  if (!maskable) {
    const r = 0.2;
    const dx = Math.max(r - x, 0, x - (1 - r));
    const dy = Math.max(r - y, 0, y - (1 - r));
    if (dx * dx + dy * dy > r * r) return null;
  }
  // Maskable icons keep their drawing inside the central 80% safe circle.
  const scale = maskable ? 0.72 : 1;
  const u = (x - 0.5) / scale + 0.5;
  const v = (y - 0.5) / scale + 0.5;
  const ring = (cx, cy) => Math.abs(Math.hypot(u - cx, v - cy) - 0.2) < 0.055;
  const left = ring(0.38, 0.5);
  const right = ring(0.62, 0.5);
  // Linked, not stacked: the right ring passes over the left one at the top, under it at the bottom.
  if (left && right) return v < 0.5 ? COPPER : WHITE;
  if (right) return COPPER;
  if (left) return WHITE;
  return BLUE;
}

function render(size, style) {
  const n = 4;
  const rows = [];
  for (let py = 0; py < size; py++) {
    const row = Buffer.alloc(1 + size * 4); // filter byte 0, then RGBA
    for (let px = 0; px < size; px++) {
      let r = 0, g = 0, b = 0, a = 0;
      for (let sy = 0; sy < n; sy++) {
        for (let sx = 0; sx < n; sx++) {
          const c = sample((px + (sx + 0.5) / n) / size, (py + (sy + 0.5) / n) / size, style);
          if (!c) continue;
          r += c[0];
          g += c[1];
          b += c[2];
          a += 1;
        }
      }
      const o = 1 + px * 4;
      row[o] = a ? Math.round(r / a) : 0;
      row[o + 1] = a ? Math.round(g / a) : 0;
      row[o + 2] = a ? Math.round(b / a) : 0;
      row[o + 3] = Math.round((a / (n * n)) * 255);
    }
    rows.push(row);
  }
  return png(size, Buffer.concat(rows));
}

function chunk(type, data) {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const body = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([len, body, crc]);
}

function png(size, raw) {
  const header = Buffer.alloc(13);
  header.writeUInt32BE(size, 0);
  header.writeUInt32BE(size, 4);
  header[8] = 8; // bit depth
  header[9] = 6; // RGBA
  const signature = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  return Buffer.concat([signature, chunk('IHDR', header), chunk('IDAT', deflateSync(raw, { level: 9 })), chunk('IEND', Buffer.alloc(0))]);
}

mkdirSync(outDir, { recursive: true });
const icons = [
  ['icon-192.png', 192, { maskable: false }],
  ['icon-512.png', 512, { maskable: false }],
  ['icon-maskable-512.png', 512, { maskable: true }],
  ['apple-touch-icon.png', 180, { maskable: true }],
  ['favicon-48.png', 48, { maskable: false }],
];
for (const [name, size, style] of icons) {
  writeFileSync(path.join(outDir, name), render(size, style));
  console.log(`wrote public/icons/${name}`);
}
