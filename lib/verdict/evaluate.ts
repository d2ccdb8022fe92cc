/**
 * evaluateReading: a reading and a spec in, a verdict with every step out (DESIGN.md §3).
 * Order: check the spec → corrections (mode, units, leads, series, temperature) → uncertainty
 * budget → decision (./decision) → reason and plain words. Errors are VerdictInputError naming
 * the field. Arithmetic on typed values (conversion, subtraction, every comparison with a limit
 * or band edge) is exact decimal arithmetic with decimal.js; see ./corrections and ./decision.
 */
import { Dec, formatExact, formatNumber } from '../units';
import { uncertaintyBudget } from './budget';
import { applyCorrections, type Corrected } from './corrections';
import { decideWithoutUncertainty, decideWithUncertainty, nearBands, type Decision } from './decision';
import { readingLabel } from './modes';
import { conformanceProbability } from './probability';
import { bandBasisText, reasonWithoutUncertainty, reasonWithUncertainty } from './reason';
import { checkSpec, type CheckedSpec } from './spec';
import { VerdictInputError, type VerdictInput, type VerdictResult, type VerdictStep } from './types';
import { explanation, probesReversed, REVERSED } from './words';

type Judged = Pick<VerdictResult, 'verdict' | 'reason' | 'zones' | 'conformanceProbability'> & {
  d: Decision;
  step: VerdictStep;
};

function probabilityStep(p: number, spec: CheckedSpec): VerdictStep {
  const upper = spec.upper === undefined ? '1' : 'Φ((T_U − y)/u)';
  const lower = spec.lower === undefined ? '' : ' − Φ((T_L − y)/u)';
  return {
    label: 'Conformance probability (normal distribution, u = U/2)',
    formula: `p_c = ${upper}${lower} = ${formatNumber(p, 6)}`,
    value: p,
    unit: '',
  };
}

function judgeKnown(x: Dec, U: number, spec: CheckedSpec): Judged {
  const d = decideWithUncertainty(x, U, spec.exact);
  const xn = x.toNumber();
  const p = conformanceProbability(xn, U / 2, spec.lower, spec.upper);
  return {
    d,
    verdict: d.verdict,
    reason: reasonWithUncertainty(d, xn, U, spec),
    zones: { lower: spec.lower, upper: spec.upper, interval: [xn - U, xn + U] },
    conformanceProbability: p,
    step: probabilityStep(p, spec),
  };
}

function judgeUnknown(x: Dec, spec: CheckedSpec): Judged {
  const bands = nearBands(spec.exact, spec);
  const d = decideWithoutUncertainty(x, spec.exact, bands);
  const band = bands.upper ?? bands.lower;
  const limit = d.side === 'lower' ? spec.exact.lower : (spec.exact.upper ?? spec.exact.lower);
  const distance = limit ? x.minus(limit).abs().toNumber() : 0;
  const step: VerdictStep = band
    ? {
        label: `No meter accuracy given: uncertainty unknown, ${bandBasisText(spec, bands)} used instead`,
        formula: `band = ${formatExact(band, 0, 6)} ${spec.unit}`,
        value: band.toNumber(),
        unit: spec.unit,
      }
    : {
        label:
          'No meter accuracy given and the spec is one-sided with no near-limit band: simple acceptance (ILAC-G8 §4.2.1, w = 0)',
        value: 0,
        unit: spec.unit,
      };
  return {
    d,
    verdict: d.verdict,
    reason: reasonWithoutUncertainty(d, distance, spec, bands),
    zones: { lower: spec.lower, upper: spec.upper, nearBand: band?.toNumber() },
    conformanceProbability: null,
    step,
  };
}

/** The value with the precision the reading and the corrections carried. */
function valueText(c: Corrected): string {
  if (c.factor.eq(1)) return formatExact(c.value, c.decimals, 12);
  const typedDigits = new Dec(c.typed.reading.value).precision(true);
  return formatExact(c.value, 0, Math.max(4, typedDigits + 1));
}

export function evaluateReading(input: VerdictInput): VerdictResult {
  if (!input || typeof input !== 'object') throw new VerdictInputError('input', 'A verdict needs a spec and a reading');
  const spec = checkSpec(input.spec);
  if (!input.reading || typeof input.reading !== 'object')
    throw new VerdictInputError('reading', 'reading is required');
  const corrected = applyCorrections(input, spec);
  corrected.steps[0].label = readingLabel(spec.mode, spec.engineRpm);
  const budget = uncertaintyBudget(input.meter, corrected, spec);
  if (budget.U !== null && !Number.isFinite(budget.U)) {
    throw new VerdictInputError('meter', 'The meter accuracy gives no finite uncertainty');
  }
  const x = corrected.value;
  const { step, d, ...judged } = budget.U === null ? judgeUnknown(x, spec) : judgeKnown(x, budget.U, spec);
  const text = valueText(corrected);
  const reason = probesReversed(corrected, spec) ? `${judged.reason} ${REVERSED}` : judged.reason;
  return {
    ...judged,
    reason,
    explanation: explanation({ d, c: corrected, spec, U: budget.U, valueText: text }),
    value: x.toNumber(),
    valueText: text,
    unit: spec.unit,
    expandedUncertainty: budget.U,
    steps: [...corrected.steps, ...budget.steps, step],
  };
}
