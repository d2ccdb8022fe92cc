/**
 * POST /api/verdicts: the request body (units as the technician typed them) and the
 * response. Structure is checked here (400); impossible values — a unit of the wrong
 * quantity, a negative corrected reading, non-finite numbers, min > max — are the
 * engine's to refuse (422, naming the field).
 */
import { z } from 'zod';
import type { VerdictStep } from '../verdict';
import { MEASUREMENT_MODES } from './enums';

/** Any JSON number, finite or not: non-finite values are refused by the engine with 422. */
const Num = z.custom<number>((v) => typeof v === 'number', { message: 'must be a number' });
const UnitText = z.string({ error: 'unit is required' }).trim().min(1, 'unit is required').max(12);
const QuantityBody = z.object({ value: Num, unit: UnitText }).strict();
const Mode = z.enum(MEASUREMENT_MODES, { error: `mode must be one of ${MEASUREMENT_MODES.join(', ')}` });
/** The reading, with the mode the meter was on (refused with 422 when it is not the spec's). */
const ReadingQuantity = z.object({ value: Num, unit: UnitText, mode: Mode.optional() }).strict();

export const SpecLimitsBody = z
  .object({
    min: Num.optional(),
    nominal: Num.optional(),
    max: Num.optional(),
    unit: UnitText,
    refTempC: Num.optional(),
    material: z.enum(['copper', 'none']).optional(),
    nearLimitPct: Num.optional(),
    /** The near-limit band as an amount in the spec's unit. */
    nearLimit: Num.optional(),
    mode: Mode.optional(),
    engineRpm: Num.optional(),
  })
  .strict();

/** The verdict inputs, without the exactly-one-of rule (so other bodies can extend them). */
export const VerdictFields = z.object({
  specId: z.number().int().positive().optional(),
  spec: SpecLimitsBody.optional(),
  reading: ReadingQuantity,
  leadResistance: QuantityBody.optional(),
  seriesResistance: z.object({ value: Num, unit: UnitText, tolerancePct: Num.optional() }).strict().optional(),
  temperatureC: Num.optional(),
  meter: z.object({ percent: Num, counts: Num, countValue: Num, unit: UnitText }).strict().optional(),
});

export const exactlyOneSpec = (b: { specId?: number; spec?: unknown }) =>
  (b.specId === undefined) !== (b.spec === undefined);
const ONE_SPEC = { message: 'Give exactly one of specId or spec.', path: ['specId'] };

export const VerdictBody = VerdictFields.strict().refine(exactlyOneSpec, ONE_SPEC);
export type VerdictBody = z.infer<typeof VerdictBody>;

export type VerdictResponse = {
  verdict: 'pass' | 'marginal' | 'fail';
  value: number;
  unit: string;
  expandedUncertainty: number | null;
  conformanceProbability: number | null;
  reason: string;
  /** The verdict in plain workshop words, corrections first. */
  explanation: string;
  /** The value as shown, with the precision the reading carried ('88.40'). */
  valueText: string;
  steps: VerdictStep[];
  zones: { lower?: number; upper?: number; nearBand?: number; interval?: [number, number] };
  /** The spec the reading was judged against, when given by id. */
  specVersion?: number;
};
