/**
 * POST /api/verdicts: the request body (units as the technician typed them) and the
 * response. Structure is checked here (400); impossible values — a unit of the wrong
 * quantity, a negative corrected reading, non-finite numbers, min > max — are the
 * engine's to refuse (422, naming the field).
 */
import { z } from 'zod';
import type { VerdictStep } from '../verdict';
import { MEASUREMENT_MODES } from './enums';

/** Marks an issue as a value the request cannot have (422), not a malformed request (400). */
export const UNPROCESSABLE = { status: 422 } as const;

/**
 * A JSON number from `min` to `max`. Not a number is a 400; a number outside the range, or
 * not finite (1e999 parses as Infinity), is a 422 naming the field, like the engine's own
 * refusals (server/middleware/validate.ts reads the params). The ranges only keep
 * the arithmetic finite; the engine applies the trade's narrower ones.
 */
const Num = (min: number, max: number) =>
  z
    .custom<number>((v) => typeof v === 'number', { message: 'must be a number' })
    .refine((v) => typeof v !== 'number' || (Number.isFinite(v) && v >= min && v <= max), {
      message: `must be a finite number from ${min} to ${max}`,
      params: UNPROCESSABLE,
    });
/** A value in the unit typed: a trillion MΩ is already far past any meter. */
const Value = Num(-1e12, 1e12);
const Percent = Num(0, 100);
const Celsius = Num(-273.15, 1000);
const UnitText = z.string({ error: 'unit is required' }).trim().min(1, 'unit is required').max(12);
const QuantityBody = z.object({ value: Value, unit: UnitText }).strict();
const Mode = z.enum(MEASUREMENT_MODES, { error: `mode must be one of ${MEASUREMENT_MODES.join(', ')}` });
/** The reading, with the mode the meter was on (refused with 422 when it is not the spec's). */
const ReadingQuantity = z.object({ value: Value, unit: UnitText, mode: Mode.optional() }).strict();

export const SpecLimitsBody = z
  .object({
    min: Value.optional(),
    nominal: Value.optional(),
    max: Value.optional(),
    unit: UnitText,
    refTempC: Celsius.optional(),
    material: z.enum(['copper', 'none']).optional(),
    nearLimitPct: Percent.optional(),
    /** The near-limit band as an amount in the spec's unit. */
    nearLimit: Num(0, 1e12).optional(),
    mode: Mode.optional(),
    engineRpm: Num(0, 30000).optional(),
  })
  .strict();

/** The verdict inputs, without the exactly-one-of rule (so other bodies can extend them). */
export const VerdictFields = z.object({
  specId: z.number().int().positive().optional(),
  spec: SpecLimitsBody.optional(),
  reading: ReadingQuantity,
  leadResistance: QuantityBody.optional(),
  seriesResistance: z.object({ value: Value, unit: UnitText, tolerancePct: Percent.optional() }).strict().optional(),
  temperatureC: Celsius.optional(),
  meter: z
    .object({ percent: Percent, counts: Num(0, 1e6), countValue: Num(0, 1e12), unit: UnitText })
    .strict()
    .optional(),
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
