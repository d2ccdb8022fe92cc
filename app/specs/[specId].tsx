import { StyleSheet } from 'react-native';
import { Stack, useLocalSearchParams, useRouter } from 'expo-router';
import { BatteryCharge } from '@/components/calculator/battery-charge';
import { Calculator } from '@/components/calculator/calculator';
import { QualitativeCheck } from '@/components/calculator/qualitative-check';
import { Citation } from '@/components/library/citation';
import { ProposeLinks } from '@/components/corrections/propose-links';
import { modelTitle } from '@/lib/format/model-title';
import { RevisionHistory } from '@/components/history/revision-history';
import { EditSpecButton } from '@/components/spec-editor/edit-spec-button';
import { SafetyNotes } from '@/components/library/safety-notes';
import { cautionCategories, defaultMode, isRestVoltage } from '@/lib/specs/classify';
import { limitsOf } from '@/lib/specs/limits';
import { SpecValues } from '@/components/library/spec-values';
import { FormAlert } from '@/components/ui/form-alert';
import { LinkRow } from '@/components/ui/link-row';
import { Screen } from '@/components/ui/screen';
import { TwoColumns } from '@/components/ui/two-columns';
import { Text } from '@/components/ui/text';
import { ErrorState, LoadingState } from '@/components/ui/states';
import { describeError } from '@/lib/api/describe-error';
import { jobLink } from '@/lib/hooks/use-add-to-job';
import { useSpecQuery } from '@/lib/hooks/use-library';
import { useIsWide } from '@/lib/theme/use-theme';

export default function SpecCardScreen() {
  const { specId, saved, ...link } = useLocalSearchParams<{
    specId: string;
    job?: string;
    retake?: string;
    saved?: string;
  }>();
  const router = useRouter();
  const wide = useIsWide();
  const spec = useSpecQuery(Number(specId));

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
  // A spec without a stated mode is read in the one its parameter's words imply.
  const mode = s.mode ?? defaultMode(s.parameter, s.quantityKind);
  const target = {
    spec: { id: s.id, modelId: s.model.id, parameter: s.parameter, componentName: s.component.name },
    ...jobLink(link),
  };
  const beepOnly = mode === 'diode_forward' ? 'diode' : mode === 'continuity' ? 'continuity' : null;
  const check = (
    <>
      <SafetyNotes categories={cautionCategories(s.component.name, s.parameter)} />
      <Calculator kind={s.quantityKind} spec={limitsOf({ ...s, mode })} job={target} />
      {beepOnly ? (
        <QualitativeCheck
          kind={beepOnly}
          job={target}
          intro={
            beepOnly === 'diode'
              ? 'Meter only beeps on its diode range? Test both ways instead of typing a forward voltage.'
              : 'Meter only beeps? Record what it showed instead of a resistance.'
          }
        />
      ) : null}
      {isRestVoltage(s.parameter) ? <BatteryCharge /> : null}
    </>
  );
  const reference = (
    <>
      <Citation spec={s} />
      <RevisionHistory specId={s.id} />
      <ProposeLinks specId={s.id} />
    </>
  );
  return (
    <Screen testID="spec-screen">
      <Stack.Screen options={{ title: s.parameter }} />
      {saved ? <FormAlert tone="success" message={`Saved as version ${saved}.`} testID="spec-saved" /> : null}
      <LinkRow
        href={`/models/${s.model.id}`}
        accessibilityLabel={`Open model sheet ${modelTitle(s.model)}`}
        onPress={() => router.push(`/models/${s.model.id}`)}
        style={styles.modelLink}
      >
        <Text color="primary">{modelTitle(s.model)}</Text>
      </LinkRow>
      <EditSpecButton specId={s.id} />
      {/* On a phone the calculator comes right after the values; on a wide screen it has the right column. */}
      <TwoColumns
        first={
          <>
            <SpecValues spec={s} />
            {wide ? reference : check}
          </>
        }
        second={wide ? check : reference}
      />
    </Screen>
  );
}

const styles = StyleSheet.create({
  modelLink: { minHeight: 44, justifyContent: 'center', alignSelf: 'flex-start' },
});
