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
  // Specbench rule (DESIGN §3.5): band = 5 % of the tolerance width; a one-sided spec has a band only when it
  // states one (% of the limit, or absolute). Exact decimals: 5 % of 1.26 is 0.063 exactly.
  it.each([
    [{ lower: 3.57, upper: 4.83 }, { nearLimitPct: 5 }, '0.063', '0.063'],
    [{ lower: 3.57, upper: 4.83 }, {}, '0.063', '0.063'],
    [{ lower: 12.6 }, { nearLimitPct: 5 }, '0.63', undefined],
    [{ lower: 12.6 }, {}, undefined, undefined],
    [{ upper: 15 }, { nearLimitPct: 5 }, undefined, '0.75'],
    [{ upper: -2 }, { nearLimitPct: 10 }, undefined, '0.2'],
    [{ upper: 15 }, { nearLimit: 0.2 }, undefined, '0.2'],
    [{ lower: 3.57, upper: 4.83 }, { nearLimitPct: 0 }, '0', '0'],
  ])('for %j with %j, the bands are lower %s / upper %s', (limits, rule, lower, upper) => {
    const bands = nearBands(limits, rule);
    expect(bands.lower?.toString()).toBe(lower);
    expect(bands.upper?.toString()).toBe(upper);
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
    expect(decideWithoutUncertainty(x, twoSided, nearBands(twoSided, { nearLimitPct: 5 })).verdict).toBe(verdict);
  });

  it.each([
    [{ lower: 12.6 }, 13.3, 'pass'],
    [{ lower: 12.6 }, 13.0, 'marginal'],
    [{ lower: 12.6 }, 12.6, 'marginal'],
    [{ lower: 12.6 }, 12.5, 'fail'],
    [{ upper: 15 }, 14, 'pass'],
    [{ upper: 15 }, 14.5, 'marginal'],
    [{ upper: 15 }, 15.01, 'fail'],
  ])('one-sided %j with a stated 5 %% band: %d is %s', (limits, x, verdict) => {
    expect(decideWithoutUncertainty(x, limits, nearBands(limits, { nearLimitPct: 5 })).verdict).toBe(verdict);
  });
});
