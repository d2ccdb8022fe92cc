import { StyleSheet, View } from 'react-native';
import type { PlanChangeDto } from '@/lib/contracts/corrections';
import { isEmptyDiff, PLAN_FIELD_LABELS, STEP_FIELD_LABELS, type PlanDiff, type StepRef } from '@/lib/plans/diff';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

const stepName = (s: StepRef) => `${s.title} (${s.id})`;

function StepList({ label, steps, testID }: { label: string; steps: string[]; testID: string }) {
  if (steps.length === 0) return null;
  return (
    <View style={styles.list} testID={testID} accessibilityLabel={label}>
      <Text variant="label">{label}</Text>
      {steps.map((s) => (
        <Text key={s}>• {s}</Text>
      ))}
    </View>
  );
}

function DiffLists({ diff, prefix }: { diff: PlanDiff; prefix: string }) {
  if (isEmptyDiff(diff)) return <Text color="textMuted">No change.</Text>;
  return (
    <>
      <StepList label="Steps added" steps={diff.added.map(stepName)} testID={`${prefix}-added`} />
      <StepList label="Steps removed" steps={diff.removed.map(stepName)} testID={`${prefix}-removed`} />
      <StepList
        label="Steps changed"
        steps={diff.changed.map((s) => `${stepName(s)}: ${s.fields.map((f) => STEP_FIELD_LABELS[f]).join(', ')}`)}
        testID={`${prefix}-changed`}
      />
      {diff.reordered ? <Text>The steps are in a new order.</Text> : null}
      {diff.planFields.length ? (
        <Text testID={`${prefix}-fields`}>
          Also changes the plan’s {diff.planFields.map((f) => PLAN_FIELD_LABELS[f]).join(', ')}.
        </Text>
      ) : null}
    </>
  );
}

export type PlanChangeViewProps = {
  plan: PlanChangeDto;
  baseVersion: number | null;
  currentVersion: number | null;
};

/** What a proposed plan change adds, removes and changes, step by step; and, if the plan moved on, what accepting does now. */
export function PlanChangeView({ plan, baseVersion, currentVersion }: PlanChangeViewProps) {
  return (
    <Card testID="plan-change">
      <Text variant="heading">Changes to the test plan “{plan.title}”</Text>
      <Text variant="small" color="textMuted">
        Proposed against version {baseVersion}
      </Text>
      {plan.changes ? (
        <DiffLists diff={plan.changes} prefix="plan-change" />
      ) : (
        <Text color="textMuted">The version it was proposed against is no longer on record.</Text>
      )}
      {plan.changesNow ? (
        <View style={styles.list} testID="plan-change-now">
          <Text variant="heading">What accepting would change in version {currentVersion}</Text>
          <DiffLists diff={plan.changesNow} prefix="plan-change-now" />
        </View>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.xs } });
