import fc from 'fast-check';
import { decideWithUncertainty, evaluateReading, type Verdict } from '@/lib/verdict';

// Limits and readings on a 1e-3 grid of realistic sizes; U from 0 to 5.
const grid = (min: number, max: number) => fc.integer({ min: min * 1000, max: max * 1000 }).map((n) => n / 1000);
const limits = fc
  .tuple(grid(0, 100), grid(0, 50), fc.constantFrom('both', 'lower', 'upper'))
  .map(([lower, width, sides]) => ({
    lower: sides === 'upper' ? undefined : lower,
    upper: sides === 'lower' ? undefined : lower + width,
  }));

describe('decision properties (fast-check)', () => {
  // Source: ILAC-G8:09/2019 §4.2.3 — a wider guard band only moves readings from pass towards marginal.
  it('widening U never turns fail into pass or marginal into pass', () => {
    fc.assert(
      fc.property(limits, grid(-10, 160), grid(0, 5), grid(0, 5), (lim, x, U, extra) => {
        const narrow: Verdict = decideWithUncertainty(x, U, lim).verdict;
        const wide: Verdict = decideWithUncertainty(x, U + extra, lim).verdict;
        if (narrow !== 'pass') expect(wide).not.toBe('pass');
      }),
    );
  });

  it('widening the meter accuracy through evaluateReading never turns fail or marginal into pass', () => {
    fc.assert(
      fc.property(grid(1, 100), grid(0, 20), grid(0, 10), grid(0, 10), (min, x, p1, dp) => {
        const run = (percent: number) =>
          evaluateReading({
            spec: { min, max: min * 1.5, unit: 'Ω' },
            reading: { value: x * 10, unit: 'Ω' },
            meter: { percent, counts: 1, countValue: 0.01, unit: 'Ω' },
          }).verdict;
        if (run(p1) !== 'pass') expect(run(p1 + dp)).not.toBe('pass');
      }),
    );
  });

  it('a reading equal to a limit is never pass when U > 0', () => {
    fc.assert(
      fc.property(
        grid(0.001, 100),
        grid(0.001, 50),
        fc.boolean(),
        fc.integer({ min: 1, max: 20 }),
        (min, width, atMax, counts) => {
          const max = min + width;
          const result = evaluateReading({
            spec: { min, max, unit: 'kΩ' },
            reading: { value: atMax ? max : min, unit: 'kΩ' },
            meter: { percent: 0.5, counts, countValue: 0.001, unit: 'kΩ' },
          });
          expect(result.expandedUncertainty).toBeGreaterThan(0);
          expect(result.verdict).not.toBe('pass');
        },
      ),
    );
  });

  it('without a meter, a reading equal to a limit is marginal', () => {
    fc.assert(
      fc.property(grid(0.001, 100), grid(0, 50), fc.boolean(), (min, width, atMax) => {
        const max = min + width;
        const result = evaluateReading({
          spec: { min, max, unit: 'V' },
          reading: { value: atMax ? max : min, unit: 'V' },
        });
        expect(result.verdict).toBe('marginal');
      }),
    );
  });
});
