import { PDFParse } from 'pdf-parse';

/** The text of a PDF with whitespace collapsed, and its page count (pdf-parse). */
export async function pdfText(data: Buffer) {
  const parser = new PDFParse({ data: new Uint8Array(data) });
  try {
    const result = await parser.getText();
    return { text: result.text.replace(/\s+/g, ' '), pages: result.total };
  } finally {
    await parser.destroy();
  }
}
