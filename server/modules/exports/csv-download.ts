import type { Response } from 'express';
import type { CsvDownload } from './export.service';

/** Writes one chunk, waiting while the client's buffer is full (or until it hangs up). */
async function send(res: Response, chunk: string): Promise<void> {
  if (res.write(chunk)) return;
  await new Promise<void>((resolve) => {
    const done = () => {
      res.off('drain', done);
      res.off('close', done);
      resolve();
    };
    res.on('drain', done).on('close', done);
  });
}

/** Streams a CSV download with backpressure; stops when the client goes away. */
export async function sendCsv(res: Response, download: CsvDownload): Promise<void> {
  res.attachment(download.fileName).type('text/csv; charset=utf-8').setHeader('Cache-Control', 'no-store');
  try {
    for await (const chunk of download.chunks) {
      if (res.destroyed) break;
      await send(res, chunk);
    }
    res.end();
  } catch (err) {
    // The status line has gone out: cut the download short rather than append an error to it.
    console.error('CSV download failed part-way:', err);
    res.destroy(err as Error);
  }
}
