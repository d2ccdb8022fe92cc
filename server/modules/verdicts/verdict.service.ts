/**
 * Judging a reading over HTTP: units as typed become canonical units, a spec named by
 * id is read from the library (its meter mode, when it states none, from the parameter's
 * words: lib/specs/classify.ts defaultMode), and the shared engine (lib/verdict) decides.
 * Every impossible input is refused with 422 naming its field, a reading taken in another
 * mode than the spec's included ('reading.mode').
 */
import type { VerdictBody, VerdictResponse } from '@/lib/contracts/verdicts';
import { defaultMode } from '@/lib/specs/classify';
import { limitsOf } from '@/lib/specs/limits';
import { verdictInputOf } from '@/lib/verdict/input';
import { CANONICAL_UNITS, parseUnit, unitKind, type CanonicalUnit } from '@/lib/units';
import { evaluateReading, VerdictInputError, type SpecLimits, type VerdictInput } from '@/lib/verdict';
import { AppDataSource } from '@/server/db/data-source';
import { AppError } from '@/server/errors/app-error';
import { Spec } from '../specs/spec.entity';

function unitAt(text: string, field: string): CanonicalUnit {
  const parsed = parseUnit(text);
  if (!parsed)
    throw AppError.unprocessable(`Unknown unit "${text}".`, [
      { path: field, message: `Unknown unit "${text}". Use one of: ${CANONICAL_UNITS.join(', ')}, ohm, kohm, Mohm.` },
    ]);
  return parsed.unit;
}

async function specLimits(body: VerdictBody, known?: Spec): Promise<{ limits: SpecLimits; version?: number }> {
  if (body.spec) {
    const { unit, ...rest } = body.spec;
    return { limits: { ...rest, unit: unitAt(unit, 'spec.unit') } };
  }
  const spec =
    known?.id === body.specId
      ? known
      : await AppDataSource.getRepository(Spec).findOneBy({ id: body.specId!, status: 'published' });
  if (!spec) throw AppError.notFound('spec', body.specId);
  const unit = spec.unit as CanonicalUnit;
  return {
    limits: limitsOf({ ...spec, unit, mode: spec.mode ?? defaultMode(spec.parameter, unitKind(unit)) }),
    version: spec.version,
  };
}

/**
 * The body with canonical units, ready for the engine. `known` is the published spec the
 * caller already holds for `body.specId` (a plan run's cached parts), saving the read.
 */
export async function toVerdictInput(
  body: VerdictBody,
  known?: Spec,
): Promise<{ input: VerdictInput; specVersion?: number }> {
  const { limits, version } = await specLimits(body, known);
  return { input: verdictInputOf(limits, body, unitAt), specVersion: version };
}

/** Runs the engine; its input errors become 422 problem details naming the field. */
export function judge(input: VerdictInput) {
  try {
    return evaluateReading(input);
  } catch (err) {
    if (err instanceof VerdictInputError)
      throw AppError.unprocessable(err.message, [{ path: err.field, message: err.message }]);
    throw err;
  }
}

export async function evaluateVerdict(body: VerdictBody): Promise<VerdictResponse> {
  const { input, specVersion } = await toVerdictInput(body);
  const result = judge(input);
  return specVersion === undefined ? result : { ...result, specVersion };
}
