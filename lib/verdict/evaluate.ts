/**
 * evaluateReading: a reading and a spec in, a verdict with every step out (DESIGN.md §3).
 * Order: check the spec → corrections (units, leads, series, temperature) → uncertainty
 * budget → decision (./decision) → reason. Errors are VerdictInputError naming the field.
 */
import { formatNumber } from '../units';
import { uncertaintyBudget } from './budget';
import { applyCorrections, q } from './corrections';
import { decideWithoutUncertainty, decideWithUncertainty, nearBands } from './decision';
import { conformanceProbability } from './probability';
import { reasonWithoutUncertainty, reasonWithUncertainty } from './reason';
import { checkSpec, type CheckedSpec } from './spec';
import { VerdictInputError, type VerdictInput, type VerdictResult, type VerdictStep } from './types';

function probabilityStep(p: number, spec: CheckedSpec): VerdictStep {
  const upper = spec.upper === undefined ? '1' : 'Φ((T_U − y)/u)';
  const lower = spec.lower === undefined ? '' : ' − Φ((T_L − y)/u)';
  return {
    label: 'Conformance probability (normal distribution, u = U/2)',
    formula: `p_c = ${upper}${lower}`,
    value: p,
    unit: '',
  };
}

function judgeKnown(
  x: number,
  U: number,
  spec: CheckedSpec,
): Pick<VerdictResult, 'verdict' | 'reason' | 'zones' | 'conformanceProbability'> & { step: VerdictStep } {
  const d = decideWithUncertainty(x, U, spec);
  const p = conformanceProbability(x, U / 2, spec.lower, spec.upper);
  return {
    verdict: d.verdict,
    reason: reasonWithUncertainty(d, x, U, spec),
    zones: { lower: spec.lower, upper: spec.upper, interval: [x - U, x + U] },
    conformanceProbability: p,
    step: probabilityStep(p, spec),
  };
}

function judgeUnknown(
  x: number,
  spec: CheckedSpec,
): Pick<VerdictResult, 'verdict' | 'reason' | 'zones' | 'conformanceProbability'> & { step: VerdictStep } {
  const bands = nearBands(spec, spec.nearLimitPct);
  const d = decideWithoutUncertainty(x, spec, bands);
  const band = (bands.upper ?? bands.lower) as number;
  const basis =
    spec.lower !== undefined && spec.upper !== undefined
      ? `(${formatNumber(spec.upper, 6)} − ${formatNumber(spec.lower, 6)})`
      : `|${formatNumber((spec.upper ?? spec.lower) as number, 6)}|`;
  return {
    verdict: d.verdict,
    reason: reasonWithoutUncertainty(d, x, spec, bands),
    zones: { lower: spec.lower, upper: spec.upper, nearBand: band },
    conformanceProbability: null,
    step: {
      label: 'No meter accuracy given: uncertainty unknown, near-limit band used instead',
      formula: `band = ${spec.nearLimitPct} % × ${basis} = ${q(band, spec.unit)}`,
      value: band,
      unit: spec.unit,
    },
  };
}

export function evaluateReading(input: VerdictInput): VerdictResult {
  if (!input || typeof input !== 'object') throw new VerdictInputError('input', 'A verdict needs a spec and a reading');
  const spec = checkSpec(input.spec);
  const corrected = applyCorrections(input, spec);
  const budget = uncertaintyBudget(input.meter, corrected, spec);
  const x = corrected.value;
  const { step, ...judged } = budget.U === null ? judgeUnknown(x, spec) : judgeKnown(x, budget.U, spec);
  return {
    ...judged,
    value: x,
    unit: spec.unit,
    expandedUncertainty: budget.U,
    steps: [...corrected.steps, ...budget.steps, step],
  };
}
