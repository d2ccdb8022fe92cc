/**
 * Proposed corrections: request schemas shared by the proposal form and the server.
 * Values follow the editors' rules (lib/contracts/curation.ts specValueIssues): units
 * must fit the parameter, so a gap proposed in ohms is refused.
 */
import { z } from 'zod';
import { specValueIssues, valueSchema, withCreateDefault } from './curation';
import { REVIEWED_FIELDS, fieldsWith, hasFlag, type SpecValues } from './spec-fields';
import {
  CORRECTION_STATUSES,
  type CorrectionKind,
  type CorrectionStatus,
  type FieldError,
  type Material,
} from './enums';
import { PlanCitation, UpdatePlanBody } from './plans';
import type { PlanDiff } from '../plans/diff';

import { safeText } from './text';

type ReviewedField = (typeof REVIEWED_FIELDS)[number] & keyof SpecValues;

/** One line of plain text, or a paragraph (lib/contracts/text.ts). */
const line = (label: string, max: number) => safeText(max, { label });
const para = (label: string, max: number) => safeText(max, { label, multiline: true });
const REVIEWED_DEFS = fieldsWith('reviewed');

/**
 * The values a proposal may change: the reviewed fields of the spec field list, checked by
 * the editors' own schemas (a unit is stored as its canonical symbol). Left out: null
 * numbers, empty text; the material is decided from the parameter when absent, and a field
 * added later (csvOptional: mode, near-limit band, engine speed) keeps the spec's value.
 */
export const ProposedValues = z
  .object(
    Object.fromEntries(
      REVIEWED_DEFS.map((f) => [
        f.key,
        f.key === 'material' || hasFlag(f, 'csvOptional') ? valueSchema(f).optional() : withCreateDefault(f),
      ]),
    ) as unknown as {
      [K in ReviewedField]: z.ZodType<K extends 'material' ? Material | undefined : SpecValues[K], unknown>;
    },
  )
  .strict();
export type ProposedValues = z.infer<typeof ProposedValues>;

/** A spec proposal as stored: the values, the parameter they are for, and the new component's name (kind 'new_component'). */
export type SpecProposal = ProposedValues & { parameter: string; component?: string };

/**
 * The plan fields a proposal may change: the editors' PATCH /api/plans/:id body without its
 * version and reason (the proposal records its base version and gives its rationale) and
 * without the citation: the proposal's own citation becomes the plan's when it is accepted,
 * as an accepted spec correction cites its source.
 */
export const ProposedPlan = UpdatePlanBody.omit({ version: true, reason: true, citation: true }).refine(
  (p) => Object.keys(p).length > 0,
  'propose at least one change to the plan',
);
export type ProposedPlan = z.infer<typeof ProposedPlan>;
/** A plan proposal as stored (kind 'plan_change'): the plan fields it changes, the model by id. */
export type PlanProposal = { plan: ProposedPlan };

/** What the `proposed` column holds; `isPlanProposal` tells the two apart. */
export type StoredProposal = SpecProposal | PlanProposal;
export const isPlanProposal = (p: StoredProposal): p is PlanProposal => 'plan' in p;

export const CitationInput = z
  .object({
    title: line('source title', 200).refine((s) => s.length > 0, 'source title is required'),
    edition: line('source edition', 200).default(''),
    page: line('source page', 40).refine((s) => s.length > 0, 'source page is required'),
    url: safeText(500, { label: 'url' })
      .refine((s) => s === '' || /^https?:\/\/\S+$/i.test(s), 'url must start with http:// or https://')
      .nullable()
      .optional()
      .transform((s) => s || null),
  })
  .strict();

export type CitationInput = z.infer<typeof CitationInput>;

/** A proposal's citation as a plan cites its source (empty edition, page and link left out). */
export const toPlanCitation = (c: CitationInput): PlanCitation => ({
  title: c.title,
  ...(c.edition ? { edition: c.edition } : {}),
  ...(c.page ? { page: c.page } : {}),
  ...(c.url ? { url: c.url } : {}),
});

/** Why the change is right: every proposal gives one. */
export const Rationale = para('rationale', 2000).refine((s) => s.length >= 10, 'say why, in at least 10 characters');
const rationale = Rationale;
const common = { values: ProposedValues, citation: CitationInput, rationale };

/** A plan's citation is shorter than a spec's (edition 60, page 40 characters): its problems at the proposal's paths. */
export const planCitationIssues = (citation: CitationInput): FieldError[] =>
  (PlanCitation.safeParse(toPlanCitation(citation)).error?.issues ?? []).map((i) => ({
    path: ['citation', ...i.path.map(String)].join('.'),
    message: i.message,
  }));

/** Adds the value rules, with the parameter the values are for. */
const checkValues = (parameter: string | undefined, values: ProposedValues, ctx: z.RefinementCtx) => {
  if (!parameter) return;
  for (const i of specValueIssues({ parameter, ...values }))
    ctx.addIssue({ code: 'custom', path: ['values', i.path], message: i.message });
};

export const ProposeBody = z
  .discriminatedUnion('kind', [
    z
      .object({
        kind: z.literal('change'),
        specId: z.number().int().positive(),
        version: z.number().int().positive(),
        ...common,
      })
      .strict(),
    z
      .object({
        kind: z.literal('new_spec'),
        componentId: z.number().int().positive(),
        parameter: line('parameter', 120).refine((s) => s.length > 0, 'parameter is required'),
        ...common,
      })
      .strict(),
    z
      .object({
        kind: z.literal('new_component'),
        modelId: z.number().int().positive(),
        component: line('component', 120).refine((s) => s.length > 0, 'component is required'),
        parameter: line('parameter', 120).refine((s) => s.length > 0, 'parameter is required'),
        ...common,
      })
      .strict(),
    z
      .object({
        kind: z.literal('plan_change'),
        planId: z.number().int().positive(),
        /** The plan version the proposal is based on; accepting it over a later one needs confirmStale. */
        version: z.number().int().positive(),
        plan: ProposedPlan,
        citation: CitationInput,
        rationale,
      })
      .strict(),
  ])
  .superRefine((b, ctx) => {
    if (b.kind === 'plan_change')
      for (const i of planCitationIssues(b.citation))
        ctx.addIssue({ code: 'custom', path: i.path.split('.'), message: i.message });
    else checkValues('parameter' in b ? b.parameter : undefined, b.values, ctx);
  });
export type ProposeBody = z.infer<typeof ProposeBody>;
export type SpecProposeBody = Exclude<ProposeBody, { kind: 'plan_change' }>;
export type PlanProposeBody = Extract<ProposeBody, { kind: 'plan_change' }>;

/** The proposer's edit while pending: `values` for a spec proposal, `plan` for a plan proposal. */
export const EditProposalBody = z
  .object({
    values: ProposedValues.optional(),
    plan: ProposedPlan.optional(),
    citation: CitationInput.optional(),
    rationale: rationale.optional(),
  })
  .strict()
  .refine(
    (b) => b.values || b.plan || b.citation || b.rationale,
    'change at least one of values, plan, citation or rationale',
  )
  .refine((b) => !(b.values && b.plan), { message: 'send values or plan, not both', path: ['plan'] });
export type EditProposalBody = z.infer<typeof EditProposalBody>;

export const AcceptBody = z
  .object({ confirmStale: z.boolean().optional(), note: para('note', 1000).optional() })
  .strict();
export const RejectBody = z
  .object({ note: para('note', 1000).refine((s) => s.length >= 3, 'tell the proposer why, in a few words') })
  .strict();
export const CorrectionsQuery = z.object({
  status: z.enum(CORRECTION_STATUSES).optional(),
  mine: z.enum(['true', 'false']).optional(),
  make: safeText(120, { label: 'make' }).optional(),
  modelId: z.coerce.number().int().positive().optional(),
});

type CorrectionCommon = {
  id: number;
  status: CorrectionStatus;
  specId: number | null;
  componentId: number | null;
  componentName: string;
  parameter: string;
  citation: { title: string; edition: string; page: string; url: string | null };
  rationale: string;
  baseVersion: number | null;
  proposer: { id: number; name: string; accepted: number; rejected: number };
  reviewerName: string | null;
  decisionNote: string | null;
  decidedAt: string | null;
  createdAt: string;
  updatedAt: string;
};
/** A proposal about a spec: the proposed values, on a model. */
export type SpecCorrectionDto = CorrectionCommon & {
  kind: Exclude<CorrectionKind, 'plan_change'>;
  modelId: number;
  modelTitle: string;
  proposed: ProposedValues;
  plan: null;
};
/** A proposal about a test plan: a generic plan has no model. */
export type PlanCorrectionDto = CorrectionCommon & {
  kind: 'plan_change';
  modelId: number | null;
  modelTitle: string | null;
  proposed: null;
  plan: PlanChangeDto;
};
export type CorrectionDto = SpecCorrectionDto | PlanCorrectionDto;

/**
 * The plan a proposal is about and what it changes: `changes` from the version it was based
 * on; `changesNow` what accepting would do to the current version, when that is a later one.
 */
export type PlanChangeDto = {
  id: number;
  title: string;
  proposed: ProposedPlan;
  changes: PlanDiff | null;
  changesNow: PlanDiff | null;
};

/** For review: the values when proposed, now, and as proposed, field by field (none for a plan). */
export type CorrectionReviewDto = CorrectionDto & {
  stale: boolean;
  currentVersion: number | null;
  fields: { field: string; proposedAgainst: unknown; current: unknown; proposed: unknown }[];
};
