/**
 * The import preview reads a file twice: parseSpecCsvDetailed checks it without keeping rows,
 * then eachSpecCsvChunk hands the rows over a chunk at a time, pausing papaparse between
 * chunks. Both must see the same rows on the same lines, whatever the file and the chunk size.
 */
import { SPEC_CSV_COLUMNS, decodeCsv, parseSpecCsvDetailed } from '@/lib/csv';
import { eachSpecCsvChunk } from '@/lib/csv/parse';
import { malformedCorpus } from '../fixtures/csv/corpus';
import { toCsv, validRow } from '../fixtures/csv/rows';

async function chunked(text: string, size: number) {
  const chunks: { line: number; raw: Record<string, string> }[][] = [];
  await eachSpecCsvChunk(text, size, async (rows) => {
    // The next chunk is read only after this one is done.
    await new Promise((r) => setTimeout(r, 0));
    chunks.push(rows);
  });
  return chunks;
}

const files: [string, string][] = [
  ...malformedCorpus('Chunkmake')
    .filter((c) => c.bytes.length > 0 && !c.bytes.includes(0))
    .flatMap((c): [string, string][] => {
      try {
        return [[c.name, decodeCsv(c.bytes)]];
      } catch {
        return []; // not UTF-8: refused before parsing
      }
    }),
  [
    'quoted line breaks, LF endings and blank lines between rows',
    `${SPEC_CSV_COLUMNS.join(',')}\n${toCsv([
      validRow('Chunkmake', { notes: 'two\nlines' }),
      validRow('Chunkmake', { component: 'stator', notes: 'a "quoted"\r\nword' }),
    ])
      .split('\r\n')
      .slice(1)
      .join('\n')}\n\n${toCsv([validRow('Chunkmake', { component: 'regulator' })]).split('\r\n')[1]}\n`,
  ],
  [
    'a BOM and 25 rows',
    `\uFEFF${toCsv(Array.from({ length: 25 }, (_, i) => validRow('Chunkmake', { component: `coil ${i}` })))}`,
  ],
];

describe('eachSpecCsvChunk', () => {
  it.each(files)('gives the rows parseSpecCsvDetailed gives: %s', async (_name, text) => {
    const whole = parseSpecCsvDetailed(text);
    for (const size of [1, 2, 7, 2000]) {
      const chunks = await chunked(text, size);
      expect(chunks.flat()).toEqual(whole.rows);
      // Every chunk but the last is full.
      expect(chunks.slice(0, -1).every((c) => c.length === size)).toBe(true);
    }
  });

  it('passes on the failure of a chunk and reads no further', async () => {
    const text = toCsv(Array.from({ length: 10 }, (_, i) => validRow('Chunkmake', { component: `coil ${i}` })));
    let calls = 0;
    await expect(
      eachSpecCsvChunk(text, 3, async () => {
        calls += 1;
        if (calls === 2) throw new Error('staging failed');
      }),
    ).rejects.toThrow('staging failed');
    await new Promise((r) => setTimeout(r, 20));
    expect(calls).toBe(2);
  });
});
