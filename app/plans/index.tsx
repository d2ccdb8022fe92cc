import { useState } from 'react';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { PlanList } from '@/components/plans/plan-list';
import { SystemFilter } from '@/components/plans/system-filter';
import { Screen } from '@/components/ui/screen';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { TextField } from '@/components/ui/text-field';
import { describeError } from '@/lib/api/describe-error';
import type { System } from '@/lib/contracts/plans';
import { usePlansQuery } from '@/lib/hooks/use-plans';

/** The test plans by symptom and system; `modelId` keeps to the plans that apply to one model. */
export default function PlansScreen() {
  const params = useLocalSearchParams<{ modelId?: string; system?: System }>();
  const router = useRouter();
  const modelId = params.modelId ? Number(params.modelId) : undefined;
  const [q, setQ] = useState('');
  const [system, setSystem] = useState<System | null>(params.system ?? null);
  const plans = usePlansQuery({ modelId, system: system ?? undefined, q });
  return (
    <Screen testID="plans-screen">
      <Stack.Screen options={{ title: 'Test plans' }} />
      <Text variant="title">Test plans</Text>
      <Text color="textMuted">From the symptom to the faulty part, cheapest and least invasive check first.</Text>
      <TextField label="Symptom" value={q} onChangeText={setQ} placeholder="e.g. no spark" testID="plans-symptom" />
      <SystemFilter value={system} onChange={setSystem} />
      {plans.isPending ? (
        <LoadingState label="Loading the test plans" />
      ) : plans.error ? (
        <ErrorState message={describeError(plans.error)} onRetry={plans.refetch} />
      ) : plans.data.length === 0 ? (
        <EmptyState message="No test plan matches." />
      ) : (
        <PlanList
          plans={plans.data}
          onOpen={(p) => router.push(`/plans/${p.id}${modelId ? `?modelId=${modelId}` : ''}`)}
        />
      )}
    </Screen>
  );
}
