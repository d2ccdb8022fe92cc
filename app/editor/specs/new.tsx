import { Pressable } from 'react-native';
import { Stack, useRouter } from 'expo-router';
import { EditorGate } from '@/components/spec-editor/editor-gate';
import { SpecCreateForm } from '@/components/spec-editor/spec-create-form';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';
import { ApiError } from '@/lib/api/client';
import { staleCurrent } from '@/lib/api/curation';
import { describeError } from '@/lib/api/describe-error';
import { useCreateSpecMutation } from '@/lib/hooks/use-curation';

/** An editor adds one spec by hand; make, model, component and source are found or created by name. */
export default function NewSpecScreen() {
  const router = useRouter();
  const create = useCreateSpecMutation();
  const existing = staleCurrent(create.error);
  const serverErrors = create.error instanceof ApiError ? create.error.errors : undefined;
  return (
    <Screen testID="new-spec-screen">
      <Stack.Screen options={{ title: 'New spec' }} />
      <EditorGate reason="to add specs">
        <Text variant="title">Add a spec</Text>
        <Text color="textMuted">
          Make, model and component are matched by name: an existing model gains the spec. Every value needs a source
          the technician can check.
        </Text>
        {create.error ? (
          <Text color="fail" accessibilityRole="alert">
            {describeError(create.error)}
          </Text>
        ) : null}
        {existing ? (
          <Pressable
            accessibilityRole="link"
            accessibilityLabel={`Edit the existing spec ${existing.parameter}`}
            onPress={() => router.push(`/editor/specs/${existing.id}`)}
          >
            <Text color="primary">Edit the existing spec “{existing.parameter}” instead</Text>
          </Pressable>
        ) : null}
        <SpecCreateForm
          submitting={create.isPending}
          serverErrors={serverErrors}
          onSubmit={(body) => create.mutate(body, { onSuccess: (spec) => router.replace(`/specs/${spec.id}`) })}
        />
      </EditorGate>
    </Screen>
  );
}
