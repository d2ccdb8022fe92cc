/**
 * Benchmark (DESIGN §8): search over 100 000 invented specs. Builds the server's
 * search index in-process and times typo-laden queries; prints p50 / p95 / max.
 * Run with `npm run bench`.
 */
import { performance } from 'node:perf_hooks';
import { SearchIndex, type SearchDoc } from '@/server/modules/search/search-index';

const MAKES = [
  'Kestrel Moto',
  'Corvane',
  'Marrowdown Engines',
  'Quillback Powersports',
  'Tarnhollow',
  'Vellum Works',
  'Brackenridge',
  'Osprine',
];
const COMPONENTS: [string, string[]][] = [
  [
    'ignition coil',
    [
      'primary winding resistance',
      'secondary winding resistance with plug cap',
      'secondary winding resistance without plug cap',
      'primary peak voltage',
    ],
  ],
  ['pickup coil', ['pickup coil resistance', 'pickup coil air gap', 'pickup coil peak voltage']],
  ['stator', ['stator winding resistance', 'stator insulation to ground', 'unloaded AC output']],
  ['spark plug', ['electrode gap']],
  ['spark plug cap', ['plug cap resistance']],
  ['plug lead', ['lead resistance']],
  ['battery', ['rest voltage']],
  ['regulator / rectifier', ['regulated voltage', 'charging current']],
  ['main fuse', ['fuse rating']],
];

function makeDocs(n: number): SearchDoc[] {
  const docs: SearchDoc[] = [];
  let model = 0;
  while (docs.length < n) {
    const make = MAKES[model % MAKES.length];
    const name = `${['Trail', 'Urban', 'Ridge', 'Drift', 'Surge', 'Vela', 'Strale', 'Moor'][model % 8]} ${100 + ((model * 37) % 1200)}`;
    const yearFrom = 1990 + (model % 34);
    for (const [component, params] of COMPONENTS) {
      for (const parameter of params) {
        docs.push({
          specId: docs.length + 1,
          modelId: model + 1,
          make,
          model: name,
          yearFrom,
          yearTo: yearFrom + 5,
          variant: `${model % 3 === 0 ? 'EU' : 'US'} market`,
          component,
          parameter,
        });
      }
    }
    model += 1;
  }
  return docs.slice(0, n);
}

const QUERIES = [
  'kestrl 900 primry',
  'pulser',
  'plug gap',
  'corvan vela secndary',
  'stator 2004',
  'rest voltge',
  'quilback surge fuse',
  'trail 137 pickup',
  'ht lead',
  'regulated voltage 2010',
];

function percentile(sorted: number[], p: number) {
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

const docs = makeDocs(100_000);
let t = performance.now();
const index = new SearchIndex(docs);
const buildMs = performance.now() - t;
const times: number[] = [];
for (let i = 0; i < 500; i += 1) {
  t = performance.now();
  index.search(QUERIES[i % QUERIES.length], 40);
  times.push(performance.now() - t);
}
times.sort((a, b) => a - b);
const p95 = percentile(times, 95);
console.log(`search index: ${docs.length} specs, built in ${buildMs.toFixed(0)} ms`);
console.log(
  `search query (500 runs): p50 ${percentile(times, 50).toFixed(2)} ms · p95 ${p95.toFixed(2)} ms · max ${times[times.length - 1].toFixed(2)} ms · target p95 ≤ 50 ms → ${p95 <= 50 ? 'met' : 'MISSED'}`,
);
