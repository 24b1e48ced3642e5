import path from 'node:path';
import { openSync } from 'fontkit';
import { describe, expect, it } from 'vitest';
import { PdfLayout } from '../../../server/reports/pdf-layout';
import { drawCachedImage, reusableImage } from '../../../server/reports/image-cache';
import { withSharedLayout } from '../../../server/reports/shared-font';
import { tinyPng } from '../systems/images';
import { pdfText } from '../systems/pdf-text';

const INTER = path.resolve(__dirname, '../../../assets/fonts/Inter_400Regular.ttf');

interface TestRun {
  advanceWidth: number;
  positions: { xAdvance: number }[];
  glyphs: { id: number }[];
}
type TestFont = { layout(text: string, features?: unknown): TestRun };

async function render(build: (layout: PdfLayout) => void): Promise<Buffer> {
  const layout = new PdfLayout('letter', { title: 'Cache test', author: 'Test shop' });
  const chunks: Buffer[] = [];
  layout.doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve) => layout.doc.on('end', () => resolve()));
  build(layout);
  layout.doc.end();
  await done;
  return Buffer.concat(chunks);
}

describe('shared font shaping', () => {
  it('when a text is shaped twice through the shared font, then both runs equal fontkit’s own and changing one leaves the next intact', () => {
    const plain = openSync(INTER) as unknown as TestFont;
    const shared = withSharedLayout(openSync(INTER)) as unknown as TestFont;
    // Expected widths come from fontkit itself (a general-purpose library) on the same font file.
    const expected = plain.layout('Superheat 10.2 °F');
    const first = shared.layout('Superheat 10.2 °F');
    expect(first.advanceWidth).toBe(expected.advanceWidth);
    expect(first.glyphs.map((g) => g.id)).toEqual(expected.glyphs.map((g) => g.id));
    // pdfkit scales a run's positions in place; the cached run must not see it.
    for (const p of first.positions) p.xAdvance *= 2;
    const second = shared.layout('Superheat 10.2 °F');
    expect(second.advanceWidth).toBe(expected.advanceWidth);
    expect(shared.layout('Subcooling').advanceWidth).toBe(plain.layout('Subcooling').advanceWidth);
  });
});

describe('shared font subsets', () => {
  it('when two subsets hold the same glyphs in the same order, then the second gets the same bytes fontkit encodes afresh', () => {
    type Sub = { includeGlyph(id: number): number; encode(): Uint8Array };
    const plain = openSync(INTER) as unknown as { createSubset(): Sub; glyphForCodePoint(c: number): { id: number } };
    const shared = withSharedLayout(openSync(INTER)) as unknown as typeof plain;
    const fill = (font: typeof plain) => {
      const subset = font.createSubset();
      for (const ch of 'Superheat °F') subset.includeGlyph(font.glyphForCodePoint(ch.codePointAt(0)!).id);
      return subset;
    };
    // Expected bytes: fontkit's own subset encoding of the same glyphs (a general-purpose library).
    const expected = Buffer.from(fill(plain).encode());
    expect(Buffer.from(fill(shared).encode()).equals(expected)).toBe(true);
    expect(Buffer.from(fill(shared).encode()).equals(expected)).toBe(true);
    const other = shared.createSubset();
    other.includeGlyph(shared.glyphForCodePoint(65).id);
    expect(Buffer.from(other.encode()).equals(expected)).toBe(false);
  });
});

describe('reused photos', () => {
  it('when two documents draw the same photo, then each embeds it under its own label and both parse', async () => {
    const photo = tinyPng(64, 48);
    const labels: string[][] = [];
    const pdfs = await Promise.all(
      [1, 2].map(() =>
        render((layout) => {
          labels.push([drawCachedImage(layout.doc, photo, 40, 40, { width: 64 }), drawCachedImage(layout.doc, photo, 140, 40, { width: 64 })]);
          layout.doc.text('Nameplate photo', 40, 120);
        }),
      ),
    );
    // A clone takes the next image number of the document drawing it, so labels never clash within one.
    for (const [a, b] of labels) expect(a).not.toBe(b);
    for (const pdf of pdfs) {
      expect(pdf.toString('latin1').match(/\/Subtype \/Image/g)?.length).toBe(2);
      expect((await pdfText(pdf)).text).toContain('Nameplate photo');
    }
  });

  it('when the bytes are not an image, then it throws as pdfkit does (the report draws a frame instead)', () => {
    return render((layout) => {
      expect(() => reusableImage(layout.doc, Buffer.from('not an image at all'))).toThrow();
    });
  });
});
