// fontkit (pdfkit's font engine) ships no types; only the one call used here is declared.
declare module 'fontkit' {
  /** Opens and parses a font file; the object has the `layout` method pdfkit looks for. */
  export function openSync(path: string): { layout(text: string): unknown };
}
