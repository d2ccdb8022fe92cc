/**
 * The search index answers a long query in slices (searchAsync), giving the event loop
 * turns, with the same answer as a query run at once; queries take turns, and a change
 * waits for the query in flight, so that query sees the index as it started.
 */
import { SearchIndex, type SearchDoc } from '@/server/modules/search/search-index';

const COMPONENTS = ['pickup coil', 'ignition coil', 'stator', 'regulator rectifier', 'starter relay'];
const PARAMETERS = ['winding resistance', 'peak voltage', 'insulation resistance', 'diode forward drop'];

/** Generated documents (mechanics only: no trade values are judged here). */
function docs(n: number): SearchDoc[] {
  return Array.from({ length: n }, (_, i) => ({
    specId: i + 1,
    modelId: Math.floor(i / 20) + 1,
    make: `Make${i % 37}`,
    model: `Model ${Math.floor(i / 20)}`,
    yearFrom: 2000 + (i % 20),
    yearTo: 2004 + (i % 20),
    variant: i % 2 ? 'EU' : 'US',
    component: COMPONENTS[i % COMPONENTS.length],
    parameter: PARAMETERS[i % PARAMETERS.length],
  }));
}

const ids = (r: { matches: { doc: SearchDoc }[] }) => r.matches.map((m) => m.doc.specId);
const all = docs(60_000);
const queries = ['resistance', 'coil winding resistance 2010', 'stater insulaton', 'make3 model 12 peak', 'diode'];

it('gives the same answer in slices as at once', async () => {
  const index = new SearchIndex(all, { sliceMs: 0 });
  for (const q of queries) {
    const atOnce = index.search(q, 40);
    const sliced = await index.searchAsync(q, 40);
    expect(sliced.total).toBe(atOnce.total);
    expect(ids(sliced)).toEqual(ids(atOnce));
    expect(atOnce.total).toBeGreaterThan(0);
  }
});

it('lets other work run while a query over many specs is in progress', async () => {
  const index = new SearchIndex(all, { sliceMs: 0 });
  let turns = 0;
  let done = false;
  const other = (async () => {
    while (!done) {
      await new Promise((r) => setImmediate(r));
      turns += 1;
    }
  })();
  // "resistance" is in two parameters of four: 30 000 postings, several pause points.
  const result = await index.searchAsync('resistance', 40);
  done = true;
  await other;
  expect(result.total).toBe(30_000);
  expect(turns).toBeGreaterThan(1);
});

it('runs queries in turn and holds a change until the query in flight is done', async () => {
  const index = new SearchIndex(all, { sliceMs: 0 });
  const target = index.search('make5 model 5 stator', 5).matches[0].doc;
  const first = index.searchAsync('make5 model 5 stator', 5);
  const change = index.exclusive(async () => index.remove(target.specId));
  const second = index.searchAsync('make5 model 5 stator', 5);
  expect(() => index.search('stator', 5)).toThrow(/busy/);
  expect(ids(await first)).toContain(target.specId);
  await change;
  expect(ids(await second)).not.toContain(target.specId);
});

it('falls back to the specs that match the most words when none matches them all', async () => {
  const index = new SearchIndex(all, { sliceMs: 0 });
  // No spec is both a pickup coil and a stator, so each answer matches one word of the two,
  // and the answer is the specs of either word's own answer.
  const either = await index.searchAsync('pickup stator', 40);
  const pickup = index.search('pickup', 40).total;
  const stator = index.search('stator', 40).total;
  expect(index.search('pickup stator', 40).total).toBe(either.total);
  expect(either.total).toBe(pickup + stator);
  // A word nothing has does not empty the answer: the specs that match the other two are the answer.
  const two = await index.searchAsync('make5 stator qqqqzz', 40);
  const both = index.search('make5 stator', 40);
  expect(both.total).toBeGreaterThan(0);
  expect(two.total).toBe(both.total);
  expect(ids(two)).toEqual(ids(both));
});
