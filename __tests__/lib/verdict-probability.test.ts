import { conformanceProbability, erf, erfc, normalCdf } from '@/lib/verdict';

describe('erf, erfc and normalCdf', () => {
  // Check values: Python 3 math.erf / math.erfc (the C library's libm), run while writing this test;
  // no published table quoted (Abramowitz & Stegun Table 7.1 lists the same, from memory).
  it.each([
    [0.5, 0.5204998778130465],
    [1, 0.8427007929497149],
    [2, 0.9953222650189527],
    [-1, -0.8427007929497149],
  ])('erf(%d) is %d to 1e-12', (x, expected) => {
    expect(Math.abs(erf(x) - expected)).toBeLessThan(1e-12);
  });

  it.each([
    [1.5, 0.033894853524689274],
    [2.5, 0.0004069520174449589],
    [3, 2.2090496998585438e-5],
    [3.5, 7.430983723414128e-7],
    [5, 1.5374597944280351e-12],
  ])('erfc(%d) is %d to 1e-12 relative', (x, expected) => {
    expect(Math.abs(erfc(x) - expected) / expected).toBeLessThan(1e-12);
  });

  it('normalCdf is ½ at 0 and Φ(z) + Φ(−z) = 1', () => {
    expect(normalCdf(0)).toBe(0.5);
    for (const z of [0.3, 1.7, 2.9, 3.1, 6]) expect(normalCdf(z) + normalCdf(-z)).toBeCloseTo(1, 14);
  });
});

describe('conformanceProbability', () => {
  // Source: JCGM 106:2012 (ISO/IEC Guide 98-4) worked example, inputs quoted; p_c = 0.66263 [computed], ±0.005.
  it('for y = 13.6, u = 1.8, T_L = 12.5, T_U = 16.3, is 0.66263', () => {
    const [y, u, lower, upper] = [13.6, 1.8, 12.5, 16.3];
    const pc = conformanceProbability(y, u, lower, upper);
    expect(Math.abs(pc - 0.66263)).toBeLessThanOrEqual(0.005);
    expect(Math.abs(pc - 0.66263)).toBeLessThan(5e-6);
  });

  // Source: JCGM 106:2012 guarded acceptance A_U = T_U − r·U with U = 2u; p_c at A_U [computed]:
  // Φ(r·U/u) = Φ(2r), single upper limit.
  it.each([
    [0, 0.5],
    [1, 0.97725],
    [1.5, 0.99865],
  ])('at the acceptance limit A_U with r = %d, is %d', (r, expected) => {
    const [u, upper] = [1.8, 16.3];
    const U = 2 * u;
    const acceptanceLimit = upper - r * U;
    const pc = conformanceProbability(acceptanceLimit, u, undefined, upper);
    expect(Math.abs(pc - expected)).toBeLessThan(1e-6);
  });

  // Source: ILAC-G8:09/2019 §4.2.3 — the lower limit is the mirror image of the upper.
  it.each([0, 1, 1.5])('at A_L = T_L + r·U with r = %d (single lower limit), equals the upper-limit value', (r) => {
    const [u, lower, upper] = [1.8, 12.5, 16.3];
    const pcLower = conformanceProbability(lower + r * 2 * u, u, lower, null);
    const pcUpper = conformanceProbability(upper - r * 2 * u, u, null, upper);
    expect(pcLower).toBeCloseTo(pcUpper, 12);
  });

  it.each([
    [4.9, 1],
    [5, 0.5],
    [5.1, 0],
  ])('with u = 0 and an upper limit of 5, at y = %d is %d (the step limit)', (y, expected) => {
    expect(conformanceProbability(y, 0, null, 5)).toBe(expected);
  });

  it('with no limits is 1', () => {
    expect(conformanceProbability(3, 1)).toBe(1);
  });

  it.each([
    [Number.NaN, 1],
    [1, -0.1],
    [1, Number.POSITIVE_INFINITY],
  ])('when y = %d or u = %d is invalid, throws RangeError', (y, u) => {
    expect(() => conformanceProbability(y, u, 0, 2)).toThrow(RangeError);
  });
});
