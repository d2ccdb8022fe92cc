import { Stack, useLocalSearchParams } from 'expo-router';
import { EditorGate } from '@/components/spec-editor/editor-gate';
import { PlanJsonForm } from '@/components/plans/plan-json-form';
import { Screen } from '@/components/ui/screen';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { Text } from '@/components/ui/text';
import { describeError } from '@/lib/api/describe-error';
import type { UpdatePlanBody } from '@/lib/contracts/plans';
import { planJsonText } from '@/lib/plans/plan-json';
import { usePlanQuery, useUpdatePlanMutation } from '@/lib/hooks/use-plans';

/** Editors: one plan as JSON; saving needs a reason and writes a new version (409 if someone saved first). */
export default function PlanEditorScreen() {
  const { planId } = useLocalSearchParams<{ planId: string }>();
  const id = Number(planId);
  const plan = usePlanQuery(id);
  const update = useUpdatePlanMutation(id);
  return (
    <Screen testID="plan-editor">
      <Stack.Screen options={{ title: 'Edit a test plan' }} />
      <EditorGate reason="Sign in as an editor to edit test plans.">
        {plan.isPending ? (
          <LoadingState label="Loading the plan" />
        ) : plan.error ? (
          <ErrorState message={describeError(plan.error)} onRetry={plan.refetch} />
        ) : (
          <>
            <Text variant="title">{plan.data.title}</Text>
            <Text color="textMuted">Version {plan.data.version}</Text>
            <PlanJsonForm
              key={plan.data.version}
              label="The plan (JSON)"
              initial={planJsonText(plan.data)}
              submitLabel="Save a new version"
              withReason
              pending={update.isPending}
              error={update.error}
              done={update.isSuccess ? `Saved as version ${update.data.version}.` : null}
              onSubmit={(value, reason) =>
                update.mutate({ ...(value as object), version: plan.data.version, reason } as UpdatePlanBody)
              }
            />
          </>
        )}
      </EditorGate>
    </Screen>
  );
}
