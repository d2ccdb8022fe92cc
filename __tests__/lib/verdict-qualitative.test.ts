import { evaluateContinuity, evaluateDiode, VerdictInputError } from '@/lib/verdict';

describe('evaluateDiode', () => {
  // Common practice, no published source: a good diode conducts one way only.
  it.each([
    ['conducts', 'open', 'pass', /^Conducts one way only, as a good diode does\./],
    ['open', 'open', 'fail', /open \(burnt out\)/],
    ['conducts', 'conducts', 'fail', /shorted/],
    ['open', 'conducts', 'marginal', /probes swapped, diode fitted backwards or terminals misidentified\?/],
  ] as const)('forward %s, reverse %s → %s', (forward, reverse, verdict, reason) => {
    const result = evaluateDiode({ forward, reverse });
    expect(result.verdict).toBe(verdict);
    expect(result.reason).toMatch(reason);
    expect(result.steps.map((s) => s.value)).toEqual([forward === 'conducts' ? 1 : 0, reverse === 'conducts' ? 1 : 0]);
  });

  it.each([
    [{ forward: 'shorted', reverse: 'open' }, 'forward'],
    [{ forward: 'open', reverse: undefined }, 'reverse'],
  ])('when given %j, throws VerdictInputError on %s', (test, field) => {
    expect(() => evaluateDiode(test as never)).toThrow(VerdictInputError);
    expect(() => evaluateDiode(test as never)).toThrow(expect.objectContaining({ field }));
  });
});

describe('evaluateContinuity', () => {
  // Common practice, no published source: an intact fuse has continuity; an open one is blown.
  it.each([
    [true, true, 'pass', /intact/],
    [false, true, 'fail', /blown/],
    [false, false, 'pass', /Open as expected/],
    [true, false, 'fail', /short/],
  ])('continuity %s when expected %s → %s', (continuity, expected, verdict, reason) => {
    const result = evaluateContinuity({ continuity, expected });
    expect(result).toMatchObject({ verdict });
    expect(result.reason).toMatch(reason);
    expect(result.steps).toHaveLength(2);
  });

  it('expects continuity when `expected` is left out', () => {
    expect(evaluateContinuity({ continuity: false }).verdict).toBe('fail');
  });

  it('when continuity is not a boolean, throws VerdictInputError on continuity', () => {
    expect(() => evaluateContinuity({ continuity: 'yes' as never })).toThrow(
      expect.objectContaining({ field: 'continuity' }),
    );
  });
});
