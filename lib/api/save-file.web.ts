/**
 * Web: hand a Blob to the browser as a download, through an object URL on a temporary
 * link (the CSV needs the bearer token, so a plain link to the API cannot fetch it).
 */
export async function saveFile(blob: Blob, fileName: string): Promise<void> {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  link.rel = 'noopener';
  document.body.appendChild(link);
  link.click();
  link.remove();
  // Give the browser a moment to start the download before the URL is released.
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
