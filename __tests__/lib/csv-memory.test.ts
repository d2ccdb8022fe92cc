/**
 * The CSV validator in bounded memory (issue 14): a file of a million tiny rows is read
 * record by record, stops at the row limit, and keeps the problems of only the first
 * rejected rows. The old parser built every record and every problem first (over 300 MB
 * for this file); the bound here fails on it.
 */
import { SPEC_CSV_COLUMNS, validateSpecCsv } from '@/lib/csv';
import { MAX_CSV_ROWS } from '@/lib/csv/parse';
import { MAX_REJECTED_KEPT } from '@/lib/csv/validate';

describe('validateSpecCsv memory', () => {
  it('when a file has a million tiny rows, stops at the limit and keeps at most the capped problems', () => {
    const text = `${SPEC_CSV_COLUMNS.join(',')}\n${'a,b\n'.repeat(1_000_000)}`;
    const heapBefore = process.memoryUsage().heapUsed;
    const result = validateSpecCsv(text);
    const grown = process.memoryUsage().heapUsed - heapBefore;

    expect(result.tooManyRows).toBe(true);
    expect(result.fileErrors[0].reason).toMatch(/more than 200,000 rows/);
    expect(result.rejected.length).toBeLessThanOrEqual(MAX_REJECTED_KEPT);
    expect(result.rejectedRows).toBeLessThanOrEqual(MAX_CSV_ROWS);
    expect(grown).toBeLessThan(150 * 2 ** 20);
  });

  it('when a file has more rejected rows than the cap, counts them all', () => {
    const text = `${SPEC_CSV_COLUMNS.join(',')}\n${'a,b\n'.repeat(5000)}`;
    const result = validateSpecCsv(text);
    expect(result.rejectedRows).toBe(5000);
    expect(new Set(result.rejected.map((r) => r.line)).size).toBe(MAX_REJECTED_KEPT);
  });
});
