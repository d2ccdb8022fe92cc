import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { ApiError } from '@/lib/api/client';
import { CitationInput, Rationale } from '@/lib/contracts/corrections';
import { PlanJsonForm } from '../plans/plan-json-form';
import { useServerErrors } from '../ui/form-failure';
import { bodyResolver } from '../ui/form-resolver';
import { CitationFields, type CitationValues } from './citation-fields';
import { proposalField, proposalServerErrors } from './proposal-body';

/** The source and rationale of a plan proposal, checked by the request's own schemas. */
const PlanProposalMeta = z.object({ citation: CitationInput, rationale: Rationale });
type PlanProposalMeta = z.output<typeof PlanProposalMeta>;

const toMeta = ({ title, edition, page, url, rationale }: CitationValues) => ({
  citation: { title, edition, page, url },
  rationale,
});

export type PlanProposalFormProps = {
  /** The plan as JSON (without its citation: the source fields below become the plan's). */
  initialJson: string;
  initial: CitationValues;
  submitLabel: string;
  pending: boolean;
  error: unknown;
  onSubmit: (body: PlanProposalMeta & { plan: unknown }) => void;
};

/**
 * A proposed change to a test plan: the plan in the editors' JSON editor, then the source and
 * why. The JSON is checked by the server with the editors' rules; its problems are listed by path.
 */
export function PlanProposalForm({
  initialJson,
  initial,
  submitLabel,
  pending,
  error,
  onSubmit,
}: PlanProposalFormProps) {
  const { control, handleSubmit, setError } = useForm<CitationValues, unknown, PlanProposalMeta>({
    defaultValues: initial,
    resolver: bodyResolver(PlanProposalMeta, toMeta, { field: proposalField }),
  });
  useServerErrors(setError, proposalServerErrors(error instanceof ApiError ? error.errors : []));
  return (
    <PlanJsonForm
      label="The plan (JSON): change the steps or fields you want changed"
      initial={initialJson}
      submitLabel={submitLabel}
      pending={pending}
      error={error}
      extra={<CitationFields control={control} rationaleLabel="Why should the plan change?" />}
      onSubmit={(plan) => void handleSubmit((meta) => onSubmit({ ...meta, plan }))()}
    />
  );
}
