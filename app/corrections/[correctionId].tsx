import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ProposalForm, type ProposalFields, type ProposalTarget } from '@/components/corrections/proposal-form';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { PlanChangeView } from '@/components/corrections/plan-change-view';
import { PlanProposalForm } from '@/components/corrections/plan-proposal-form';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import type { EditProposalBody, PlanCorrectionDto, SpecCorrectionDto } from '@/lib/contracts/corrections';
import { planJsonText } from '@/lib/plans/plan-json';
import { useCorrectionQuery, useEditProposalMutation } from '@/lib/hooks/use-corrections';
import { usePlanQuery } from '@/lib/hooks/use-plans';
import { CANONICAL_UNITS, parseUnit, unitsOfKind } from '@/lib/units';

const show = (v: number | null) => (v === null ? '' : String(v));

function fieldsOf(c: SpecCorrectionDto): ProposalFields {
  return {
    component: c.componentName,
    parameter: c.parameter,
    min: show(c.proposed.min),
    nominal: show(c.proposed.nominal),
    max: show(c.proposed.max),
    refTempC: show(c.proposed.refTempC),
    unit: parseUnit(c.proposed.unit)?.unit ?? 'Ω',
    testPoints: c.proposed.testPoints ?? '',
    conditions: c.proposed.conditions ?? '',
    ...citationOf(c),
  };
}

const citationOf = (c: SpecCorrectionDto | PlanCorrectionDto) => ({
  title: c.citation.title,
  edition: c.citation.edition,
  page: c.citation.page,
  url: c.citation.url ?? '',
  rationale: c.rationale,
});

function targetOf(c: SpecCorrectionDto): ProposalTarget {
  if (c.kind === 'change') return { kind: 'change', specId: c.specId!, version: c.baseVersion! };
  if (c.kind === 'new_spec') return { kind: 'new_spec', componentId: c.componentId! };
  return { kind: 'new_component', modelId: c.modelId };
}

/** One of my proposals: read it, and edit it while it is pending. */
export default function ProposalScreen() {
  const { correctionId } = useLocalSearchParams<{ correctionId: string }>();
  const router = useRouter();
  const correction = useCorrectionQuery(Number(correctionId));
  const edit = useEditProposalMutation(Number(correctionId));
  const forPlan = correction.data?.kind === 'plan_change' ? correction.data : null;
  // The plan as it is now, for editing a pending plan proposal over it.
  const plan = usePlanQuery(forPlan?.status === 'pending' ? forPlan.plan.id : 0);
  if (correction.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the proposal" />
      </Screen>
    );
  if (correction.error)
    return (
      <Screen>
        <ErrorState message={describeError(correction.error)} onRetry={correction.refetch} />
      </Screen>
    );
  const c = correction.data;
  const done = { onSuccess: () => router.replace('/corrections') };
  if (c.kind === 'plan_change')
    return (
      <Screen testID="proposal-screen">
        <Stack.Screen options={{ title: `Proposal #${c.id}` }} />
        <CorrectionCard c={c} />
        <PlanChangeView plan={c.plan} baseVersion={c.baseVersion} currentVersion={c.currentVersion} />
        {c.status === 'pending' && plan.data ? (
          <>
            <Text variant="heading">Edit while it waits</Text>
            <PlanProposalForm
              initialJson={planJsonText({ ...plan.data, ...c.plan.proposed }, { citation: false })}
              initial={citationOf(c)}
              submitLabel="Save the changes"
              pending={edit.isPending}
              error={edit.error}
              onSubmit={(b) => edit.mutate(b as EditProposalBody, done)}
            />
          </>
        ) : null}
      </Screen>
    );
  const kind = parseUnit(c.proposed.unit)?.kind;
  return (
    <Screen testID="proposal-screen">
      <Stack.Screen options={{ title: `Proposal #${c.id}` }} />
      <CorrectionCard c={c} />
      {c.status === 'pending' ? (
        <>
          <Text variant="heading">Edit while it waits</Text>
          {edit.error ? (
            <Text color="fail" accessibilityRole="alert">
              {describeError(edit.error)}
            </Text>
          ) : null}
          <ProposalForm
            target={targetOf(c)}
            initial={fieldsOf(c)}
            units={c.kind === 'change' && kind ? unitsOfKind(kind) : [...CANONICAL_UNITS]}
            submitting={edit.isPending}
            serverErrors={edit.error instanceof ApiError ? edit.error.errors : []}
            submitLabel="Save the changes"
            onSubmit={(b) => edit.mutate({ values: b.values, citation: b.citation, rationale: b.rationale }, done)}
          />
        </>
      ) : null}
    </Screen>
  );
}
