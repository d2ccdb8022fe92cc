/** Job sheets and their readings: request schemas and answers, shared by client and server. */
import { z } from 'zod';
import { DIODE_STATES } from './enums';
import { safeText } from './text';
import { VerdictFields, exactlyOneSpec, type VerdictResponse } from './verdicts';

/** VIN / frame numbers: letters, digits, spaces, dashes, dots and slashes. */
const MachineId = safeText(40).regex(/^[A-Za-z0-9 ./-]*$/, 'Letters, digits, spaces, dots, dashes and slashes only');
/** One line of plain text; job notes may span lines (lib/contracts/text.ts). */
const Text = (max: number) => safeText(max);
const Notes = safeText(4000, { multiline: true });

export const CreateJobBody = z
  .object({
    modelId: z.number().int().positive().optional(),
    machineLabel: Text(160).optional(),
    machineId: MachineId.optional(),
    customerRef: Text(80).optional(),
    notes: Notes.optional(),
  })
  .strict()
  .refine((b) => b.modelId !== undefined || (b.machineLabel ?? '').length > 0, {
    message: 'Pick a model from the library or describe the machine.',
    path: ['machineLabel'],
  });
export type CreateJobBody = z.infer<typeof CreateJobBody>;

export const UpdateJobBody = z
  .object({
    machineLabel: Text(160).optional(),
    machineId: MachineId.optional(),
    customerRef: Text(80).optional(),
    notes: Notes.optional(),
    status: z.enum(['open', 'closed']).optional(),
  })
  .strict();
export type UpdateJobBody = z.infer<typeof UpdateJobBody>;

export const JobsQuery = z.object({
  q: Text(120).optional(),
  status: z.enum(['open', 'closed']).optional(),
});

/**
 * A check on a meter that only beeps, judged by the engine (lib/verdict/qualitative.ts):
 * a diode's forward and reverse tests, or continuity (expected unless `expected` is false).
 */
export const ReadingCheck = z.discriminatedUnion(
  'kind',
  [
    z.object({ kind: z.literal('diode'), forward: z.enum(DIODE_STATES), reverse: z.enum(DIODE_STATES) }).strict(),
    z.object({ kind: z.literal('continuity'), continuity: z.boolean(), expected: z.boolean().optional() }).strict(),
  ],
  { error: "check.kind must be 'diode' or 'continuity'" },
);
export type ReadingCheck = z.infer<typeof ReadingCheck>;

const CORRECTIONS = ['leadResistance', 'seriesResistance', 'temperatureC', 'meter'] as const;

/**
 * A meter value (`reading`, judged against a spec) or a beep-only `check` (against a diode or
 * continuity spec by id, or described by `label`); never both.
 */
export const ReadingBody = VerdictFields.extend({
  reading: VerdictFields.shape.reading.optional(),
  check: ReadingCheck.optional(),
  /** What was measured, when the spec is typed by hand. */
  label: Text(200).optional(),
  /** The reading this one re-takes (it is struck through, not deleted). */
  retakeOf: z.number().int().positive().optional(),
  /** When it was taken on the device (readings queued offline arrive later). */
  takenAt: z.string().datetime({ offset: true }).optional(),
})
  .strict()
  .refine((b) => (b.reading === undefined) !== (b.check === undefined), {
    message: 'Give exactly one of reading (a meter value) or check (a diode or continuity result).',
    path: ['reading'],
  })
  .refine((b) => (b.check === undefined ? exactlyOneSpec(b) : b.spec === undefined), {
    message: 'Give exactly one of specId or spec (a check goes by specId, or by label alone).',
    path: ['specId'],
  })
  .refine((b) => b.check === undefined || CORRECTIONS.every((k) => b[k] === undefined), {
    message: 'A diode or continuity check takes no test-lead, resistor, temperature or meter-accuracy figures.',
    path: ['check'],
  })
  .refine((b) => b.specId !== undefined || (b.label ?? '').length > 0, {
    message: 'Say what was measured.',
    path: ['label'],
  });
export type ReadingBody = z.infer<typeof ReadingBody>;

export const IDEMPOTENCY_KEY = /^[A-Za-z0-9_.:-]{8,80}$/;

/** Readings keep the verdict's reason and steps; the plain words and shown value are the live answer's. */
export type ReadingDto = Omit<VerdictResponse, 'specVersion' | 'explanation' | 'valueText'> & {
  explanation?: string;
  valueText?: string;
  id: number;
  jobId: number;
  label: string;
  componentName: string;
  specId: number | null;
  specVersion: number | null;
  specLimits: Record<string, unknown>;
  inputs: Record<string, unknown>;
  /** The spec has been edited since this reading was judged. */
  specChangedSince: boolean;
  citation: string | null;
  supersededBy: number | null;
  takenAt: string;
  createdAt: string;
  idempotencyKey: string;
};

export type JobSummaryDto = {
  id: number;
  ownerId: number;
  ownerName: string;
  modelId: number | null;
  modelTitle: string | null;
  machineLabel: string;
  machineId: string;
  customerRef: string;
  notes: string | null;
  status: 'open' | 'closed';
  counts: { pass: number; marginal: number; fail: number };
  createdAt: string;
  updatedAt: string;
};

export type JobDetailDto = JobSummaryDto & { readings: ReadingDto[] };
