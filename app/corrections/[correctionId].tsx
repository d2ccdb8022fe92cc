import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ProposalForm, type ProposalFields, type ProposalTarget } from '@/components/corrections/proposal-form';
import { CorrectionCard } from '@/components/corrections/correction-card';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import type { CorrectionDto } from '@/lib/contracts/corrections';
import { useCorrectionQuery, useEditProposalMutation } from '@/lib/hooks/use-corrections';
import { CANONICAL_UNITS, parseUnit, unitsOfKind } from '@/lib/units';

const show = (v: number | null) => (v === null ? '' : String(v));

function fieldsOf(c: CorrectionDto): ProposalFields {
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
    title: c.citation.title,
    edition: c.citation.edition,
    page: c.citation.page,
    url: c.citation.url ?? '',
    rationale: c.rationale,
  };
}

function targetOf(c: CorrectionDto): ProposalTarget {
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
            onSubmit={(b) =>
              edit.mutate(
                { values: b.values, citation: b.citation, rationale: b.rationale },
                { onSuccess: () => router.replace('/corrections') },
              )
            }
          />
        </>
      ) : null}
    </Screen>
  );
}
