/**
 * Request schemas and response shapes of the read API, shared by the client and the
 * server: the server validates with these schemas, the client is typed by them.
 */
import { z } from 'zod';
import type { CanonicalUnit, Material, QuantityKind, RevisionOrigin, SpecStatus } from './enums';
import type { SpecSnapshot, SpecValues } from './spec-fields';
import { safeText } from './text';

export type { QuantityKind } from './enums';

export const IdParams = z.object({
  id: z.coerce
    .number({ error: 'id must be a number' })
    .int('id must be a whole number')
    .positive('id must be positive')
    .max(2_147_483_647),
});
export type IdParams = z.infer<typeof IdParams>;

/** Query limits (a longer query says nothing a shorter one does not, and costs the server more). */
export const SEARCH_MAX_CHARS = 120;
export const SEARCH_MAX_WORDS = 12;

export const SearchQuery = z.object({
  q: z
    .string({ error: 'q is required' })
    .trim()
    .min(1, 'Type at least one character')
    .max(SEARCH_MAX_CHARS, `Keep the query to ${SEARCH_MAX_CHARS} characters or fewer`)
    .refine(
      (q) => q.split(/[^\p{L}\p{N}]+/u).filter(Boolean).length <= SEARCH_MAX_WORDS,
      `Keep the query to ${SEARCH_MAX_WORDS} words or fewer`,
    ),
  limit: z.coerce.number().int().min(1).max(100).default(40),
});
export type SearchQuery = z.infer<typeof SearchQuery>;

export const ModelsQuery = z.object({
  make: safeText(120, { label: 'make' }).optional(),
});
export type ModelsQuery = z.infer<typeof ModelsQuery>;

export type ModelRefDto = {
  id: number;
  make: { id: number; name: string };
  name: string;
  yearFrom: number;
  yearTo: number | null;
  variant: string;
};

export type ModelSummaryDto = ModelRefDto & { componentCount: number; specCount: number };

export type SpecSummaryDto = {
  id: number;
  componentId: number;
  parameter: string;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  refTempC: number | null;
  material: Material;
  status: SpecStatus;
  version: number;
  /** e.g. '2.9–3.7 Ω', ready to show inline. */
  display: string;
};

export type ComponentDto = {
  id: number;
  name: string;
  locationNotes: string | null;
  connectorNotes: string | null;
};

export type ModelDetailDto = ModelSummaryDto & {
  components: (ComponentDto & { specs: SpecSummaryDto[] })[];
};

export type SourceDto = {
  id: number;
  title: string;
  edition: string;
  publisher: string | null;
  year: number | null;
  kind: 'service_manual' | 'bulletin' | 'datasheet' | 'handbook';
  url: string | null;
};

export type RevisionDto = {
  id: number;
  version: number;
  changedFields: string[];
  authorName: string;
  reason: string;
  origin: RevisionOrigin;
  originRef: string | null;
  createdAt: string;
  snapshot: Partial<SpecSnapshot>;
};

/** A spec card: every value field of the list (lib/contracts/spec-fields.ts), its citation, place and history. */
export type SpecDetailDto = SpecSummaryDto &
  Omit<SpecValues, 'sourceId'> & {
    source: SourceDto | null;
    component: ComponentDto;
    model: ModelRefDto;
    updatedAt: string;
    revisions: RevisionDto[];
  };

export type SearchHitDto = {
  specId: number;
  component: string;
  parameter: string;
  quantityKind: QuantityKind;
  min: number | null;
  nominal: number | null;
  max: number | null;
  unit: CanonicalUnit;
  display: string;
  score: number;
};

export type SearchGroupDto = { model: ModelRefDto; hits: SearchHitDto[] };

export type SearchResultDto = { query: string; total: number; groups: SearchGroupDto[] };

export type HealthDto = { status: 'ok'; database: 'up'; specs: number; time: string };
