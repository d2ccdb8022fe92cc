/**
 * Proposed corrections: request schemas shared by the proposal form and the server.
 * Values follow the editors' rules (lib/contracts/curation.ts specValueIssues): units
 * must fit the parameter, so a gap proposed in ohms is refused.
 */
import { z } from 'zod';
import { specValueIssues, valueSchema, withCreateDefault } from './curation';
import { REVIEWED_FIELDS, fieldsWith, hasFlag, type SpecValues } from './spec-fields';
import { CORRECTION_STATUSES, type CorrectionKind, type CorrectionStatus, type Material } from './enums';

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

/** A proposal as stored: the values, the parameter they are for, and the new component's name (kind 'new_component'). */
export type StoredProposal = ProposedValues & { parameter: string; component?: string };

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

const common = {
  values: ProposedValues,
  citation: CitationInput,
  rationale: para('rationale', 2000).refine((s) => s.length >= 10, 'say why, in at least 10 characters'),
};

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
  ])
  .superRefine((b, ctx) => checkValues('parameter' in b ? b.parameter : undefined, b.values, ctx));
export type ProposeBody = z.infer<typeof ProposeBody>;

export const EditProposalBody = z
  .object({
    values: ProposedValues.optional(),
    citation: CitationInput.optional(),
    rationale: common.rationale.optional(),
  })
  .strict()
  .refine((b) => b.values || b.citation || b.rationale, 'change at least one of values, citation or rationale');
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

export type CorrectionDto = {
  id: number;
  kind: CorrectionKind;
  status: CorrectionStatus;
  specId: number | null;
  componentId: number | null;
  modelId: number;
  modelTitle: string;
  componentName: string;
  parameter: string;
  proposed: ProposedValues;
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
/** For review: the values when proposed, now, and as proposed, field by field. */
export type CorrectionReviewDto = CorrectionDto & {
  stale: boolean;
  currentVersion: number | null;
  fields: { field: string; proposedAgainst: unknown; current: unknown; proposed: unknown }[];
};
