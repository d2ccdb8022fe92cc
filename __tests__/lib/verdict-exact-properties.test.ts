/**
 * Exact decimals (issue 10): typed numbers are decimals, and the engine must give the answer exact
 * decimal arithmetic gives. The oracle here is independent of decimal.js: every typed value is an
 * integer count of 10^-6 (BigInt), and unit factors are the exact ratios of NIST SP 811 App. B.
 */
import fc from 'fast-check';
import { convert, type CanonicalUnit } from '@/lib/units';
import { evaluateReading } from '@/lib/verdict';

const SCALE = 6; // typed decimals with up to 6 places
/** The decimal n × 10^-scale, as the number a technician would type. */
const decimal = (n: bigint, scale: number) => {
  const neg = n < 0n;
  const s = (neg ? -n : n).toString().padStart(scale + 1, '0');
  return Number(`${neg ? '-' : ''}${s.slice(0, -scale)}.${s.slice(-scale)}`);
};
const micro = (n: bigint) => decimal(n, SCALE);
const typed = (min: number, max: number) => fc.bigInt({ min: BigInt(min * 1e6), max: BigInt(max * 1e6) });

/** Same-kind pairs: to = from × num × 10^-places (1 in = 25.4 mm, 1 thou = 0.0254 mm: NIST SP 811 App. B). */
const PAIRS: [CanonicalUnit, CanonicalUnit, bigint, number][] = [
  ['kΩ', 'Ω', 1000n, 0],
  ['MΩ', 'kΩ', 1000n, 0],
  ['MΩ', 'Ω', 1000000n, 0],
  ['V', 'mV', 1000n, 0],
  ['A', 'mA', 1000n, 0],
  ['in', 'mm', 254n, 1],
  ['thou', 'mm', 254n, 4],
  ['in', 'thou', 1000n, 0],
];

describe('conversion of typed decimals', () => {
  // Source: NIST SP 811 (2008) App. B — 1 in = 25.4 mm exactly; keep exact factors, round only for display.
  it('converting a typed decimal and back gives the typed decimal, for every unit pair of a kind', () => {
    fc.assert(
      fc.property(typed(0, 100000), fc.constantFrom(...PAIRS), fc.boolean(), (n, [a, b], flip) => {
        const [from, to] = flip ? [b, a] : [a, b];
        const x = micro(n);
        expect(convert(convert(x, from, to), to, from)).toBe(x);
      }),
    );
  });

  it('a conversion gives the nearest number to the exact decimal (1.01346 mm is 39.9 thou, not 39.900000000000006)', () => {
    expect(convert(1.01346, 'mm', 'thou')).toBe(39.9);
    fc.assert(
      fc.property(typed(0, 1000), fc.constantFrom(...PAIRS), (n, [from, to, num, places]) => {
        expect(convert(micro(n), from, to)).toBe(decimal(n * num, SCALE + places));
      }),
    );
  });
});

describe('limits are judged as the typed decimals say', () => {
  it('a reading typed exactly on a limit is never PASS and never FAIL (with or without a meter, leads or units)', () => {
    fc.assert(
      fc.property(
        typed(1, 500),
        typed(0, 200),
        fc.constantFrom('min', 'max'),
        fc.boolean(),
        fc.boolean(),
        typed(0, 2),
        fc.option(fc.integer({ min: 1, max: 9 })),
        (limit, width, which, twoSided, viaLeads, lead, counts) => {
          const min = which === 'min' ? limit : limit - width;
          const max = which === 'max' ? limit : limit + width;
          const spec = {
            min: twoSided || which === 'min' ? micro(min) : undefined,
            max: twoSided || which === 'max' ? micro(max) : undefined,
            unit: 'Ω' as const,
          };
          // Leads are typed separately; the reading is typed so that reading − leads is the limit exactly.
          const raw = viaLeads ? limit + lead : limit;
          const result = evaluateReading({
            spec,
            reading: { value: micro(raw), unit: 'Ω' },
            leadResistance: viaLeads ? { value: micro(lead), unit: 'Ω' } : undefined,
            meter: counts === null ? undefined : { percent: 0.5, counts, countValue: 0.01, unit: 'Ω' },
          });
          expect(result.verdict).toBe('marginal');
        },
      ),
    );
  });

  it('a reading typed in another unit that equals a limit is on the limit (mm against thou, Ω against kΩ)', () => {
    fc.assert(
      fc.property(typed(1, 100), fc.boolean(), (n, length) => {
        // thou → mm: × 0.0254 exactly (NIST SP 811 App. B); kΩ → Ω: × 1000.
        const reading = length ? decimal(n * 254n, SCALE + 4) : decimal(n * 1000n, SCALE);
        const result = evaluateReading({
          spec: { max: micro(n), unit: length ? 'thou' : 'kΩ' },
          reading: { value: reading, unit: length ? 'mm' : 'Ω' },
        });
        expect(result.verdict).toBe('marginal');
      }),
    );
  });

  it('without a meter, the verdict of reading − leads agrees with integer arithmetic at every band edge', () => {
    fc.assert(
      fc.property(typed(1, 50), typed(0, 10), typed(0, 60), typed(0, 2), (lo, w, r, lead) => {
        const hi = lo + w * 20n + 20n; // width a multiple of 20 micro-units, so 5 % of it is whole
        const band = (hi - lo) / 20n;
        const value = r - lead;
        if (value < 0n) return;
        const expected =
          value < lo || value > hi ? 'fail' : value - lo <= band || hi - value <= band ? 'marginal' : 'pass';
        const result = evaluateReading({
          spec: { min: micro(lo), max: micro(hi), unit: 'Ω' },
          reading: { value: micro(r), unit: 'Ω' },
          leadResistance: { value: micro(lead), unit: 'Ω' },
        });
        expect(result.verdict).toBe(expected);
        expect(result.value).toBe(micro(value));
      }),
      { numRuns: 500 },
    );
  });
});
