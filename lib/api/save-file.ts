/**
 * Native: Specbench ships as a web app; saving files on a phone needs a share sheet,
 * which is not in this build. The web version is save-file.web.ts.
 */
export async function saveFile(_blob: Blob, _fileName: string): Promise<void> {
  throw new Error('Downloads are available in the web app.');
}
