/**
 * The calculator's engine input → the body of POST /api/jobs/:id/readings. Library
 * specs go by id (the server judges against its own limits and records the version);
 * limits typed by hand go with the reading, with the technician's words for what was
 * measured. Units are the calculator's canonical units, which the API accepts as typed. The
 * reading carries the meter mode it was taken in, so the server refuses one taken in another mode.
 */
import type { ReadingBody } from '../contracts/jobs';
import type { BeepCheck, VerdictInput } from '../verdict';

export type ReadingTarget = { specId: number } | { label: string };

/** What a calculator hands "Add to job": a meter value with its spec, or a beep-only check. */
export type ReadingDraft = { kind: 'measured'; input: VerdictInput } | { kind: 'check'; check: BeepCheck };

type Extra = { retakeOf?: number; takenAt?: string };

export function draftBody(draft: ReadingDraft, target: ReadingTarget, extra: Extra = {}): ReadingBody {
  if (draft.kind === 'measured') return toReadingBody(draft.input, target, extra);
  const body: ReadingBody = {
    ...('specId' in target ? { specId: target.specId } : { label: target.label.trim() }),
    check: { ...draft.check },
  };
  if (extra.retakeOf !== undefined) body.retakeOf = extra.retakeOf;
  if (extra.takenAt !== undefined) body.takenAt = extra.takenAt;
  return body;
}

const defined = <T extends object>(o: T) =>
  Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined && v !== null)) as T;

export function toReadingBody(input: VerdictInput, target: ReadingTarget, extra: Extra = {}): ReadingBody {
  const body: ReadingBody =
    'specId' in target
      ? { specId: target.specId, reading: defined({ ...input.reading }) }
      : {
          spec: defined({
            min: input.spec.min ?? undefined,
            nominal: input.spec.nominal ?? undefined,
            max: input.spec.max ?? undefined,
            unit: input.spec.unit,
            refTempC: input.spec.refTempC ?? undefined,
            material: input.spec.material ?? undefined,
            nearLimitPct: input.spec.nearLimitPct ?? undefined,
            nearLimit: input.spec.nearLimit ?? undefined,
            mode: input.spec.mode ?? undefined,
            engineRpm: input.spec.engineRpm ?? undefined,
          }),
          label: target.label.trim(),
          reading: defined({ ...input.reading }),
        };
  if (input.leadResistance) body.leadResistance = { ...input.leadResistance };
  if (input.seriesResistance) body.seriesResistance = defined({ ...input.seriesResistance });
  if (input.temperatureC !== undefined) body.temperatureC = input.temperatureC;
  if (input.meter) body.meter = { ...input.meter };
  if (extra.retakeOf !== undefined) body.retakeOf = extra.retakeOf;
  if (extra.takenAt !== undefined) body.takenAt = extra.takenAt;
  return body;
}
