import { StyleSheet, View } from 'react-native';
import type { PlanStep } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type PlanStepsProps = { steps: PlanStep[] };

const checkText = (s: PlanStep) => {
  const c = s.check;
  if (c.kind === 'spec') return `${c.component}: ${c.parameter}`;
  if (c.kind === 'limits') return `${c.limits.min ?? '–'} … ${c.limits.max ?? '–'} ${c.limits.unit}`;
  if (c.kind === 'qualitative') return c.expected;
  return c.choices.map((x) => x.label).join(' / ');
};

/** A plan's steps in their order of work, each with its test point and what is checked. */
export function PlanSteps({ steps }: PlanStepsProps) {
  return (
    <View style={styles.list} testID="plan-steps">
      {steps.map((s, i) => (
        <Card key={s.id}>
          <Text variant="heading">
            {i + 1}. {s.title}
          </Text>
          <Text variant="small">{s.testPoint.text}</Text>
          <Text variant="small" color="textMuted">
            Checks: {checkText(s)}
          </Text>
        </Card>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.sm } });
