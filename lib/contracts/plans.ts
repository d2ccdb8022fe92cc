/**
 * Test plans (guided diagnosis): the documented plan file format, the editors' request
 * bodies, the run requests and the answers, shared by client and server. The graph rules
 * (no loops, no missing steps, every outcome leads somewhere) are lib/plans/validate.ts.
 */
import { z } from 'zod';
import { CAUTION_CATEGORIES } from '../specs/classify';
import type { QuantityKind } from '../units';
import { DIODE_STATES, type FieldError, type Material, type MeasurementMode } from './enums';
import type { ReadingDto } from './jobs';
import { safeText } from './text';

/** The systems of a machine, in the trade's order of work (the model sheet groups by it). */
export const SYSTEMS = ['ignition', 'charging', 'starting', 'fuel', 'lighting'] as const;
export type System = (typeof SYSTEMS)[number];
export const SYSTEM_LABELS: Record<System, string> = {
  ignition: 'Ignition',
  charging: 'Charging',
  starting: 'Starting',
  fuel: 'Fuel pump and injection electrics',
  lighting: 'Lighting and signalling',
};

/** Checks judged by eye or by the meter's continuity / diode mode. */
export const QUALITATIVE_TESTS = ['continuity', 'diode', 'spark', 'visual'] as const;
export type QualitativeTest = (typeof QUALITATIVE_TESTS)[number];
export const VERDICT_OUTCOMES = ['pass', 'marginal', 'fail'] as const;
export const PLAN_STATUSES = ['published', 'draft'] as const;
export type PlanStatus = (typeof PLAN_STATUSES)[number];

/** Plan text may span lines (instructions, advice); the free-text rule is lib/contracts/text.ts. */
const Text = (max: number) => safeText(max, { multiline: true });
const Needed = (max: number, what: string) => Text(max).min(1, `${what} is required`);
export const StepKey = z
  .string()
  .trim()
  .regex(/^[a-z0-9][a-z0-9-]{0,59}$/, 'Use 1–60 lower-case letters, digits and dashes');
/** Finite and bounded, so the engine's arithmetic stays finite (as in lib/contracts/verdicts.ts). */
const Num = z.number().finite().min(-1e12).max(1e12);

export const Finding = z
  .object({ part: Needed(120, 'The likely faulty part'), advice: Needed(600, 'The advice') })
  .strict();
export type Finding = z.infer<typeof Finding>;

/** Where an outcome leads: another step of the plan, or a finding (the likely faulty part). */
export const Target = z.union([z.object({ step: StepKey }).strict(), z.object({ finding: Finding }).strict()]);
export type Target = z.infer<typeof Target>;

export const TypedLimits = z
  .object({ min: Num.optional(), nominal: Num.optional(), max: Num.optional(), unit: Needed(12, 'unit') })
  .strict();
export type TypedLimits = z.infer<typeof TypedLimits>;

export const StepCheck = z.discriminatedUnion('kind', [
  /** A library spec, looked up for the job's model by component and parameter; `limits` when the model has none. */
  z
    .object({
      kind: z.literal('spec'),
      component: Needed(120, 'component'),
      parameter: Needed(160, 'parameter'),
      limits: TypedLimits.optional(),
    })
    .strict(),
  z.object({ kind: z.literal('limits'), limits: TypedLimits }).strict(),
  z
    .object({
      kind: z.literal('qualitative'),
      test: z.enum(QUALITATIVE_TESTS),
      expected: Needed(200, 'expected'),
      /** A continuity check that passes on an open circuit (insulation to ground). */
      open: z.boolean().optional(),
    })
    .strict(),
  z
    .object({
      kind: z.literal('observation'),
      choices: z
        .array(z.object({ id: StepKey, label: Needed(120, 'label') }).strict())
        .min(2, 'At least two choices')
        .max(8),
    })
    .strict(),
]);
export type StepCheck = z.infer<typeof StepCheck>;

export const TestPoint = z
  .object({
    text: Needed(300, 'The test point'),
    /** The component whose connector face is drawn, and the probed pin numbers. */
    component: Text(120).optional(),
    pins: z.array(z.number().int().min(1).max(64)).max(8).optional(),
  })
  .strict();

export const PlanStep = z
  .object({
    id: StepKey,
    title: Needed(160, 'title'),
    instructions: Needed(2000, 'instructions'),
    preconditions: z.array(Needed(200, 'A precondition')).max(8).default([]),
    cautions: z.array(z.enum(CAUTION_CATEGORIES)).max(3).default([]),
    testPoint: TestPoint,
    check: StepCheck,
    /** Outcome ('pass', 'marginal', 'fail', a choice id, or 'skip') → target. */
    next: z.record(StepKey, Target),
  })
  .strict();
export type PlanStep = z.infer<typeof PlanStep>;

export const PlanCitation = z
  .object({
    title: Needed(200, 'The source title'),
    edition: Text(60).optional(),
    page: Text(40).optional(),
    url: z.url().max(400).optional(),
  })
  .strict();
export type PlanCitation = z.infer<typeof PlanCitation>;

/** A library model by its natural key: make, model name, first year and variant. */
const ModelKey = z
  .object({
    make: Needed(120, 'make'),
    name: Needed(120, 'model'),
    yearFrom: z.number().int(),
    variant: Text(120).default(''),
  })
  .strict();

const planFields = {
  title: Needed(160, 'title'),
  symptom: Needed(200, 'symptom'),
  system: z.enum(SYSTEMS),
  /** null: a generic plan, for every model that has the components its steps name. */
  modelId: z.number().int().positive().nullable(),
  /** The model by its natural key, so a plan file moves between libraries; wins over modelId. */
  model: z
    .object({
      make: Needed(120, 'make'),
      name: Needed(120, 'model'),
      yearFrom: z.number().int(),
      variant: Text(120).default(''),
    })
    .strict()
    .optional(),
  status: z.enum(PLAN_STATUSES),
  citation: PlanCitation,
  steps: z.array(PlanStep).min(1, 'A plan needs at least one step').max(40),
};

/** POST /api/plans, and one plan of an imported file. */
export const PlanBody = z
  .object({ ...planFields, modelId: planFields.modelId.default(null), status: planFields.status.default('published') })
  .strict();
export type PlanBody = z.infer<typeof PlanBody>;

/** PATCH /api/plans/:id: any of the plan's fields (no defaults: what is left out stays), with the version it is based on. */
export const UpdatePlanBody = z
  .object(planFields)
  .partial()
  .extend({ version: z.number().int().positive(), reason: Needed(500, 'A reason') })
  .strict();
export type UpdatePlanBody = z.infer<typeof UpdatePlanBody>;

export const PlansQuery = z.object({
  modelId: z.coerce.number().int().positive().optional(),
  system: z.enum(SYSTEMS).optional(),
  q: Text(120).optional(),
});
export type PlansQuery = z.infer<typeof PlansQuery>;

export type PlanSummaryDto = {
  id: number;
  title: string;
  symptom: string;
  system: System;
  modelId: number | null;
  modelTitle: string | null;
  status: PlanStatus;
  version: number;
  stepCount: number;
  updatedAt: string;
};
export type PlanDto = PlanSummaryDto & { citation: PlanCitation; steps: PlanStep[] };
export type PlanRevisionDto = {
  id: number;
  version: number;
  authorName: string;
  reason: string;
  changedFields: string[];
  createdAt: string;
};
export type PlanImportDto = { created: number; plans: PlanSummaryDto[] };

// ── Runs ────────────────────────────────────────────────────────────────────

export const StartRunBody = z.object({ planId: z.number().int().positive() }).strict();
export const RunParams = z.object({
  jobId: z.coerce.number().int().positive(),
  runId: z.coerce.number().int().positive(),
});
export const JobParams = z.object({ jobId: z.coerce.number().int().positive() });

const Quantity = z.object({ value: Num, unit: Needed(12, 'unit') }).strict();
/** A meter reading for a measured step; `limits` when the step offers typed limits. */
export const StepReading = z
  .object({
    value: Num,
    unit: Needed(12, 'unit'),
    leadResistance: Quantity.optional(),
    seriesResistance: Quantity.extend({ tolerancePct: Num.optional() }).strict().optional(),
    temperatureC: Num.optional(),
    meter: z
      .object({ percent: Num, counts: Num, countValue: Num, unit: Needed(12, 'unit') })
      .strict()
      .optional(),
    limits: TypedLimits.optional(),
  })
  .strict();
export type StepReading = z.infer<typeof StepReading>;

const DiodeState = z.enum(DIODE_STATES);
export const RunResultBody = z
  .object({
    stepId: z.union([StepKey, z.number().int().transform(String)]),
    reading: StepReading.optional(),
    /** 'pass' / 'fail' for a qualitative check, a choice id for an observation. */
    outcome: StepKey.optional(),
    /** A diode check's two tests (the engine judges them), instead of an outcome. */
    diode: z.object({ forward: DiodeState, reverse: DiodeState }).strict().optional(),
    skipReason: Text(300).min(1, 'Say why the step is skipped').optional(),
  })
  .strict()
  .refine((b) => [b.reading, b.outcome, b.diode, b.skipReason].filter((x) => x !== undefined).length === 1, {
    message: 'Give exactly one of reading, outcome, diode or skipReason.',
    path: ['reading'],
  });
export type RunResultBody = z.infer<typeof RunResultBody>;

export type SpecForStepDto = {
  /** How the meter is set (decided from the parameter and unit when the spec does not say), and the engine speed of the check. */
  mode: MeasurementMode | null;
  engineRpm: number | null;
  id: number;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: string;
  /** What the run's calculator needs to judge as the server does: temperature correction and the near-limit band. */
  refTempC: number | null;
  material: Material;
  nearLimit: number | null;
  display: string;
  testPoints: string | null;
  conditions: string | null;
};
/** A component's connector face, drawn with the probed pins highlighted (components/plans/connector-face). */
export const Connector = z
  .object({
    rows: z.number().int().min(1).max(4),
    columns: z.number().int().min(1).max(16),
    /** Pin 1's corner and the counting direction along the top row, as seen from `view`. */
    numbering: z.enum(['left-to-right', 'right-to-left']),
    view: z.enum(['harness', 'component']),
    key: z.enum(['top', 'bottom', 'left', 'right']),
    pins: z
      .array(
        z
          .object({ number: z.number().int().min(1).max(64), name: Needed(40, 'pin name'), wire: Text(40).nullable() })
          .strict(),
      )
      .min(1),
  })
  .strict()
  .refine((c) => c.pins.every((p) => p.number <= c.rows * c.columns), {
    message: 'A pin number is larger than rows × columns',
    path: ['pins'],
  });
export type ConnectorDto = z.infer<typeof Connector>;
export const ConnectorBody = z.object({ connector: Connector.nullable() }).strict();
/** The documented JSON file: `{ "format": "specbench-plans/1", "plans": [...], "connectors": [...] }`. */
export const PLAN_FILE_FORMAT = 'specbench-plans/1';
export const PlanFile = z
  .object({
    format: z.literal(PLAN_FILE_FORMAT),
    plans: z.array(PlanBody).max(200).default([]),
    connectors: z
      .array(z.object({ model: ModelKey, component: Needed(120, 'component'), connector: Connector }).strict())
      .max(500)
      .default([]),
  })
  .strict();
export type PlanFile = z.infer<typeof PlanFile>;

export type RunStepDto = PlanStep & {
  position: number;
  /** The library spec this step judges against on the job's model, or null (typed limits). */
  spec: SpecForStepDto | null;
  connector: ConnectorDto | null;
};
export type RunOutcome = 'pass' | 'marginal' | 'fail' | 'skipped' | string;
export type RunResultDto = {
  id: number;
  stepId: string;
  title: string;
  outcome: RunOutcome;
  verdict: 'pass' | 'marginal' | 'fail' | null;
  reason: string;
  readingId: number | null;
  skipReason: string | null;
  createdAt: string;
};
export type RunDto = {
  id: number;
  jobId: number;
  planId: number;
  planVersion: number;
  title: string;
  symptom: string;
  system: System;
  status: 'active' | 'concluded';
  stepCount: number;
  currentStep: RunStepDto | null;
  /** Every step as resolved for the job's model, so the device can go on with no signal (lib/plans/local-run.ts). */
  steps: RunStepDto[];
  finding: (Finding & { stepId: string }) | null;
  results: RunResultDto[];
  startedAt: string;
  updatedAt: string;
};
export type RunAnswerDto = {
  judged: RunResultDto;
  reading: ReadingDto | null;
  next: RunStepDto | null;
  finding: RunDto['finding'];
  run: RunDto;
};
export type PlanProblem = FieldError;
