import { decideWithoutUncertainty, decideWithUncertainty, nearBands } from '@/lib/verdict';

describe('decideWithUncertainty (U known)', () => {
  // Source: ILAC-G8:09/2019 §4.2.3 — non-binary rule with w = U at an upper limit TL: pass below TL − w;
  // conditional pass in [TL − w, TL]; conditional fail in (TL, TL + w]; fail above TL + w.
  // Specbench's marginal = conditional pass or conditional fail. TL = 10, U = 0.5 (exact in binary).
  it.each([
    [9, 'pass', 'pass'],
    [9.5, 'marginal', 'conditional-pass'], // exactly TL − U: the closed end of ILAC's conditional-pass zone
    [9.8, 'marginal', 'conditional-pass'],
    [10, 'marginal', 'conditional-pass'], // on the limit
    [10.25, 'marginal', 'conditional-fail'],
    [10.5, 'marginal', 'conditional-fail'], // exactly TL + U: closed end of (TL, TL + w]
    [10.75, 'fail', 'fail'],
  ])('at an upper limit 10 with U = 0.5, x = %d is %s (%s)', (x, verdict, zone) => {
    expect(decideWithUncertainty(x, 0.5, { upper: 10 })).toMatchObject({ verdict, zone });
  });

  // Source: ILAC-G8:09/2019 §4.2.3 — the mirror image applies at a lower limit. TL = 5, U = 0.5.
  it.each([
    [6, 'pass', 'pass'],
    [5.5, 'marginal', 'conditional-pass'],
    [5, 'marginal', 'conditional-pass'],
    [4.75, 'marginal', 'conditional-fail'],
    [4.5, 'marginal', 'conditional-fail'],
    [4.25, 'fail', 'fail'],
  ])('at a lower limit 5 with U = 0.5, x = %d is %s (%s)', (x, verdict, zone) => {
    expect(decideWithUncertainty(x, 0.5, { lower: 5 })).toMatchObject({
      verdict,
      zone,
      side: verdict === 'pass' ? undefined : 'lower',
    });
  });

  // Source: ISO 14253-1:2017 (from memory) — conformity proven only when y ± U lies wholly inside the tolerance.
  it('when the interval is wider than the tolerance, is marginal at both limits', () => {
    expect(decideWithUncertainty(4, 2, { lower: 3, upper: 5 })).toMatchObject({ verdict: 'marginal', side: 'both' });
  });

  it('with U = 0 a reading on the limit is marginal and one just inside passes', () => {
    expect(decideWithUncertainty(10, 0, { upper: 10 }).verdict).toBe('marginal');
    expect(decideWithUncertainty(9.999, 0, { upper: 10 }).verdict).toBe('pass');
  });
});

describe('nearBands and decideWithoutUncertainty (U unknown)', () => {
  // Specbench rule (DESIGN §3.5): band = 5 % of the tolerance width; one-sided: 5 % of the limit (decision).
  it.each([
    [{ lower: 3.57, upper: 4.83 }, 5, 0.05 * (4.83 - 3.57), 0.05 * (4.83 - 3.57)],
    [{ lower: 12.6 }, 5, 0.05 * 12.6, undefined],
    [{ upper: 15 }, 5, undefined, 0.05 * 15],
    [{ upper: -2 }, 10, undefined, 0.1 * 2],
    [{ lower: 3.57, upper: 4.83 }, 0, 0, 0],
  ])('for %j at %d %%, the bands are lower %d / upper %d', (limits, pct, lower, upper) => {
    const bands = nearBands(limits, pct);
    if (lower === undefined) expect(bands.lower).toBeUndefined();
    else expect(bands.lower).toBeCloseTo(lower, 12);
    if (upper === undefined) expect(bands.upper).toBeUndefined();
    else expect(bands.upper).toBeCloseTo(upper, 12);
  });

  const twoSided = { lower: 3.57, upper: 4.83 };
  it.each([
    [3.9, 'pass'],
    [4.76, 'pass'], // 0.07 from the max, outside the 0.063 band
    [4.8, 'marginal'],
    [4.83, 'marginal'],
    [4.84, 'fail'],
    [3.6, 'marginal'],
    [3.57, 'marginal'],
    [3.56, 'fail'],
  ])('for 3.57–4.83 with the 5 %% band, %d is %s', (x, verdict) => {
    expect(decideWithoutUncertainty(x, twoSided, nearBands(twoSided, 5)).verdict).toBe(verdict);
  });

  it.each([
    [{ lower: 12.6 }, 13.3, 'pass'],
    [{ lower: 12.6 }, 13.0, 'marginal'],
    [{ lower: 12.6 }, 12.6, 'marginal'],
    [{ lower: 12.6 }, 12.5, 'fail'],
    [{ upper: 15 }, 14, 'pass'],
    [{ upper: 15 }, 14.5, 'marginal'],
    [{ upper: 15 }, 15.01, 'fail'],
  ])('one-sided %j with the 5 %% band: %d is %s', (limits, x, verdict) => {
    expect(decideWithoutUncertainty(x, limits, nearBands(limits, 5)).verdict).toBe(verdict);
  });
});
