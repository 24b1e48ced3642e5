/** Native: templates are downloaded from the web app (the admin screens are laptop-first). */
export async function saveFile(_blob: Blob, _fileName: string): Promise<void> {
  throw new Error('Template downloads work in the web app.');
}
