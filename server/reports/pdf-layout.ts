import path from 'node:path';
import { openSync } from 'fontkit';
import PDFDocument from 'pdfkit';
import { drawCachedImage } from './image-cache';
import { withSharedLayout } from './shared-font';

export const FONT = { regular: 'Inter', medium: 'Inter-Medium', bold: 'Inter-Bold' } as const;
const FONT_DIR = path.resolve(__dirname, '../../assets/fonts');

// Parsed once per process and shared by every document, with their shaping remembered across
// documents (shared-font.ts): parsing and shaping per report cost about twice the rest of the render.
// pdfkit takes a fontkit font as a font source.
let fonts: Record<keyof typeof FONT, Buffer> | undefined;
function sharedFonts() {
  const open = (file: string) => withSharedLayout(openSync(path.join(FONT_DIR, file))) as unknown as Buffer;
  fonts ??= { regular: open('Inter_400Regular.ttf'), medium: open('Inter_600SemiBold.ttf'), bold: open('Inter_700Bold.ttf') };
  return fonts;
}

/** Paper sizes in points (1/72 in): US Letter 8.5 × 11 in, ISO A4 210 × 297 mm. */
export const PAPER = { letter: 'LETTER', a4: 'A4' } as const;
export type Paper = keyof typeof PAPER;

const MARGIN_PT = 32;
const INK = '#1d2a33';
const MUTED = '#56646e';
const RULE = '#c9d1d6';

export interface Column {
  header: string;
  /** Share of the usable width (the shares of a table add up to 1). */
  share: number;
}

/** A pdfkit document with the shipped Inter fonts and a few layout helpers that keep a cursor and break pages. */
export class PdfLayout {
  readonly doc: PDFKit.PDFDocument;

  constructor(paper: Paper, info: { title: string; author: string }) {
    this.doc = new PDFDocument({
      size: PAPER[paper],
      margin: MARGIN_PT,
      bufferPages: true,
      info: { Title: info.title, Author: info.author },
    });
    const shared = sharedFonts();
    this.doc.registerFont(FONT.regular, shared.regular);
    this.doc.registerFont(FONT.medium, shared.medium);
    this.doc.registerFont(FONT.bold, shared.bold);
    this.doc.font(FONT.regular).fontSize(8.5).fillColor(INK);
  }

  get left() {
    return this.doc.page.margins.left;
  }
  /** Usable width in points (narrowed while drawing beside images). */
  get width() {
    return this.narrowWidth ?? this.doc.page.width - this.doc.page.margins.left - this.doc.page.margins.right;
  }
  private narrowWidth: number | undefined;
  private get bottom() {
    return this.doc.page.height - this.doc.page.margins.bottom - 14; // room for the footer line
  }

  /** Starts a new page when less than `heightPt` is left on this one. */
  ensure(heightPt: number) {
    if (this.doc.y + heightPt > this.bottom) this.doc.addPage();
  }

  /** A section heading, kept on one page with at least `keepWithPt` of what follows it. */
  heading(text: string, keepWithPt = 40) {
    this.ensure(keepWithPt);
    this.doc.moveDown(0.35).font(FONT.bold).fontSize(9.5).fillColor(INK).text(text, this.left, this.doc.y, { width: this.width });
    const y = this.doc.y + 1;
    this.doc
      .moveTo(this.left, y)
      .lineTo(this.left + this.width, y)
      .lineWidth(0.5)
      .strokeColor(RULE)
      .stroke();
    this.doc.y = y + 3;
    this.doc.font(FONT.regular).fontSize(8.5);
  }

  paragraph(text: string, options: { muted?: boolean; bold?: boolean; size?: number } = {}) {
    this.doc
      .font(options.bold ? FONT.medium : FONT.regular)
      .fontSize(options.size ?? 8.5)
      .fillColor(options.muted ? MUTED : INK);
    this.ensure(this.doc.heightOfString(text, { width: this.width }));
    this.doc.text(text, this.left, this.doc.y, { width: this.width });
    this.doc.font(FONT.regular).fontSize(8.5).fillColor(INK);
  }

  /** A table with a header row; each row breaks to a new page whole (with the header repeated). */
  table(columns: Column[], rows: string[][]) {
    const widths = columns.map((c) => c.share * this.width);
    const pad = 1.5;
    const drawRow = (cells: string[], header: boolean) => {
      this.doc.font(header ? FONT.medium : FONT.regular).fontSize(header ? 6.5 : 7.5);
      const height = Math.max(...cells.map((cell, i) => this.doc.heightOfString(cell || ' ', { width: widths[i] - pad * 2 }))) + pad * 2;
      if (this.doc.y + height > this.bottom) {
        this.doc.addPage();
        if (!header)
          drawRow(
            columns.map((c) => c.header),
            true,
          );
        this.doc.font(header ? FONT.medium : FONT.regular).fontSize(header ? 6.5 : 7.5);
      }
      const top = this.doc.y;
      let x = this.left;
      cells.forEach((cell, i) => {
        this.doc.fillColor(header ? MUTED : INK).text(cell, x + pad, top + pad, { width: widths[i] - pad * 2 });
        x += widths[i];
      });
      this.doc
        .moveTo(this.left, top + height)
        .lineTo(this.left + this.width, top + height)
        .lineWidth(0.3)
        .strokeColor(RULE)
        .stroke();
      this.doc.y = top + height;
      this.doc.x = this.left;
    };
    drawRow(
      columns.map((c) => c.header),
      true,
    );
    for (const row of rows) drawRow(row, false);
    this.doc.fillColor(INK).font(FONT.regular).fontSize(8.5);
  }

  /**
   * Draws `left` in a narrowed column and the images in a grid at the right (two per row, each fitted in
   * a `cellPt` box with its caption), then moves below whichever is taller. Unreadable images show a frame.
   */
  besideImages(title: string, items: { data: Buffer; caption: string }[], cellPt: number, left: (widthPt: number) => void) {
    if (items.length === 0) {
      left(this.width);
      return;
    }
    const gap = 6;
    const gridWidth = cellPt * 2 + gap;
    const rows = Math.ceil(items.length / 2);
    const gridHeight = 12 + rows * (cellPt * 0.75 + 12);
    this.ensure(gridHeight);
    const top = this.doc.y;
    const x0 = this.left + this.width - gridWidth;
    this.doc.font(FONT.medium).fontSize(7.5).fillColor(MUTED).text(title, x0, top, { width: gridWidth, lineBreak: false });
    items.forEach((item, i) => {
      const x = x0 + (i % 2) * (cellPt + gap);
      const y = top + 12 + Math.floor(i / 2) * (cellPt * 0.75 + 12);
      try {
        drawCachedImage(this.doc, item.data, x, y, { fit: [cellPt, cellPt * 0.75], align: 'center', valign: 'center' });
      } catch {
        this.doc
          .rect(x, y, cellPt, cellPt * 0.75)
          .lineWidth(0.5)
          .strokeColor(RULE)
          .stroke();
      }
      this.doc
        .font(FONT.regular)
        .fontSize(6.5)
        .fillColor(MUTED)
        .text(item.caption, x, y + cellPt * 0.75 + 1, { width: cellPt, ellipsis: true, lineBreak: false });
    });
    this.doc.x = this.left;
    this.doc.y = top;
    this.narrowWidth = this.width - gridWidth - 14;
    try {
      left(this.narrowWidth);
    } finally {
      this.narrowWidth = undefined;
    }
    this.doc.y = Math.max(this.doc.y, top + gridHeight);
    this.doc.x = this.left;
    this.doc.font(FONT.regular).fontSize(8.5).fillColor(INK);
  }

  /** Signature lines side by side. */
  signatures(labels: string[]) {
    this.ensure(44);
    const top = this.doc.y + 22;
    const each = (this.width - 24 * (labels.length - 1)) / labels.length;
    labels.forEach((label, i) => {
      const x = this.left + i * (each + 24);
      this.doc
        .moveTo(x, top)
        .lineTo(x + each, top)
        .lineWidth(0.6)
        .strokeColor(INK)
        .stroke();
      this.doc
        .fontSize(7.5)
        .fillColor(MUTED)
        .text(label, x, top + 3, { width: each });
    });
    this.doc.y = top + 16;
    this.doc.x = this.left;
    this.doc.fontSize(8.5).fillColor(INK);
  }

  /** Writes the footer on every page and returns the finished PDF. */
  finish(footer: (page: number, pages: number) => string): Promise<Buffer> {
    const chunks: Buffer[] = [];
    const done = new Promise<Buffer>((resolve, reject) => {
      this.doc.on('data', (c: Buffer) => chunks.push(c));
      this.doc.on('end', () => resolve(Buffer.concat(chunks)));
      this.doc.on('error', reject);
    });
    const range = this.doc.bufferedPageRange();
    for (let i = range.start; i < range.start + range.count; i++) {
      this.doc.switchToPage(i);
      const y = this.doc.page.height - this.doc.page.margins.bottom - 8;
      // Drawing below the bottom margin would add a page: lift the margin while writing the footer.
      const bottom = this.doc.page.margins.bottom;
      this.doc.page.margins.bottom = 0;
      this.doc
        .font(FONT.regular)
        .fontSize(7)
        .fillColor(MUTED)
        .text(footer(i + 1, range.count), this.left, y, { width: this.width, align: 'center', lineBreak: false });
      this.doc.page.margins.bottom = bottom;
    }
    this.doc.end();
    return done;
  }
}
