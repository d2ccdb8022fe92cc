import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { ProposalForm, type ProposalFields, type ProposalTarget } from '@/components/corrections/proposal-form';
import { SignInPrompt } from '@/components/corrections/sign-in-prompt';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { useProposeMutation } from '@/lib/hooks/use-corrections';
import { useSpecQuery } from '@/lib/hooks/use-library';
import { useSession } from '@/lib/session/session-provider';
import { CANONICAL_UNITS, unitsOfKind } from '@/lib/units';

const show = (v: number | null) => (v === null ? '' : String(v));

function initialFor(spec: SpecDetailDto, missing: string | undefined): ProposalFields {
  const blank = {
    component: '',
    parameter: '',
    min: '',
    nominal: '',
    max: '',
    refTempC: '',
    testPoints: '',
    conditions: '',
  };
  const fromSpec = {
    component: spec.component.name,
    parameter: spec.parameter,
    min: show(spec.min),
    nominal: show(spec.nominal),
    max: show(spec.max),
    refTempC: show(spec.refTempC),
    testPoints: spec.testPoints ?? '',
    conditions: spec.conditions ?? '',
  };
  return {
    ...(missing ? blank : fromSpec),
    unit: spec.unit,
    title: '',
    edition: '',
    page: '',
    url: '',
    rationale: '',
  };
}

export default function ProposeCorrectionScreen() {
  const { specId, missing } = useLocalSearchParams<{ specId: string; missing?: 'spec' | 'component' }>();
  const router = useRouter();
  const session = useSession();
  const spec = useSpecQuery(Number(specId));
  const propose = useProposeMutation();
  if (session.status !== 'signed-in')
    return (
      <Screen>
        <SignInPrompt reason="to propose a correction" />
      </Screen>
    );
  if (spec.isPending)
    return (
      <Screen>
        <LoadingState label="Loading the spec" />
      </Screen>
    );
  if (spec.error)
    return (
      <Screen>
        <ErrorState message={describeError(spec.error)} onRetry={spec.refetch} />
      </Screen>
    );
  const s = spec.data;
  const target: ProposalTarget =
    missing === 'spec'
      ? { kind: 'new_spec', componentId: s.component.id }
      : missing === 'component'
        ? { kind: 'new_component', modelId: s.model.id }
        : { kind: 'change', specId: s.id, version: s.version };
  const heading =
    missing === 'spec'
      ? `Propose a missing spec for ${s.component.name}`
      : missing === 'component'
        ? `Propose a missing component for ${s.model.make.name} ${s.model.name}`
        : `Propose a correction to ${s.component.name} — ${s.parameter}`;
  const serverErrors = propose.error instanceof ApiError ? propose.error.errors : [];
  return (
    <Screen testID="propose-screen">
      <Stack.Screen options={{ title: 'Propose a correction' }} />
      <Text variant="title">{heading}</Text>
      <Text color="textMuted">
        An editor checks every proposal against its source before it reaches the library. You will be told the decision
        by e-mail and under “My proposals”.
      </Text>
      {propose.error ? (
        <Text color="fail" accessibilityRole="alert">
          {describeError(propose.error)}
        </Text>
      ) : null}
      <ProposalForm
        target={target}
        initial={initialFor(s, missing)}
        submitting={propose.isPending}
        serverErrors={serverErrors}
        units={missing ? [...CANONICAL_UNITS] : unitsOfKind(s.quantityKind)}
        submitLabel="Send the proposal"
        onSubmit={(body) => propose.mutate(body, { onSuccess: () => router.replace('/corrections') })}
      />
    </Screen>
  );
}
