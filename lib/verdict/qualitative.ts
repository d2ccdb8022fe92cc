/**
 * Qualitative checks with a meter's diode or continuity mode. Steps record each test as
 * a number so they fit VerdictStep: value 1 = conducts / continuity, 0 = open.
 *
 * Diode decision: a diode that conducts only in the *reverse* test still conducts one way
 * only, so the part itself is probably sound; what is unproven is its orientation (probes
 * swapped, the diode fitted backwards, or the band misread). That is *marginal* with a
 * "re-test" reason rather than a fail, since condemning a good part is the costlier mistake.
 */
import type { DiodeState } from '../contracts/enums';
import { VerdictInputError, type QualitativeResult, type VerdictStep } from './types';

export type { DiodeState };
export type DiodeTest = { forward: DiodeState; reverse: DiodeState };
export type ContinuityTest = { continuity: boolean; expected?: boolean };

function requireState(value: unknown, field: string): DiodeState {
  if (value !== 'conducts' && value !== 'open')
    throw new VerdictInputError(field, `${field} must be 'conducts' or 'open'`);
  return value;
}

const stateStep = (label: string, state: DiodeState): VerdictStep => ({
  label,
  formula: state,
  value: state === 'conducts' ? 1 : 0,
  unit: '',
});

export function evaluateDiode(test: DiodeTest): QualitativeResult {
  if (!test || typeof test !== 'object')
    throw new VerdictInputError('input', 'A diode check needs forward and reverse results');
  const forward = requireState(test.forward, 'forward');
  const reverse = requireState(test.reverse, 'reverse');
  const steps = [
    stateStep('Forward test: red probe on the anode, black on the cathode (band)', forward),
    stateStep('Reverse test: probes swapped', reverse),
  ];
  if (forward === 'conducts' && reverse === 'open') {
    return { verdict: 'pass', reason: 'Conducts one way only, as a good diode does.', steps };
  }
  if (forward === 'open' && reverse === 'open') {
    return { verdict: 'fail', reason: 'Open in both directions: the diode is open (burnt out).', steps };
  }
  if (forward === 'conducts' && reverse === 'conducts') {
    return { verdict: 'fail', reason: 'Conducts in both directions: the diode is shorted.', steps };
  }
  return {
    verdict: 'marginal',
    reason:
      'Conducts one way only, but in the reverse direction: probes swapped, diode fitted backwards or terminals misidentified? Re-test with red on the anode.',
    steps,
  };
}

/** Fuses and wires expect continuity (the default); a check may also expect an open circuit. */
export function evaluateContinuity(test: ContinuityTest): QualitativeResult {
  if (!test || typeof test.continuity !== 'boolean')
    throw new VerdictInputError('continuity', 'continuity must be true or false');
  const expected = test.expected ?? true;
  if (typeof expected !== 'boolean') throw new VerdictInputError('expected', 'expected must be true or false');
  const steps: VerdictStep[] = [
    { label: 'Continuity expected', formula: expected ? 'yes' : 'no', value: expected ? 1 : 0, unit: '' },
    { label: 'Continuity measured', formula: test.continuity ? 'yes' : 'no', value: test.continuity ? 1 : 0, unit: '' },
  ];
  if (test.continuity === expected) {
    const reason = expected
      ? 'Continuity as expected: the fuse or conductor is intact.'
      : 'Open as expected: no short.';
    return { verdict: 'pass', reason, steps };
  }
  const reason = expected
    ? 'No continuity: open circuit. A fuse that reads open is blown.'
    : 'Continuity where the circuit should be open: a short.';
  return { verdict: 'fail', reason, steps };
}

/** A beep-only check as a job keeps it (POST /api/jobs/:id/readings `check`). */
export type BeepCheck = ({ kind: 'diode' } & DiodeTest) | ({ kind: 'continuity' } & ContinuityTest);

export function evaluateCheck(check: BeepCheck): QualitativeResult {
  return check.kind === 'diode' ? evaluateDiode(check) : evaluateContinuity(check);
}

/** 1 when the meter showed conduction (the diode's forward test, or continuity), 0 when open. */
export const checkValue = (check: BeepCheck): number =>
  (check.kind === 'diode' ? check.forward === 'conducts' : check.continuity) ? 1 : 0;

/** What the meter showed, in words: 'Forward conducts, reverse open', 'Continuity', 'Open circuit'. */
export function checkText(check: BeepCheck): string {
  if (check.kind === 'diode') return `Forward ${check.forward}, reverse ${check.reverse}`;
  const shown = check.continuity ? 'Continuity' : 'Open circuit';
  return check.expected === false ? `${shown} (open expected)` : shown;
}
