import { Pressable, StyleSheet, View } from 'react-native';
import { SYSTEM_LABELS, type PlanSummaryDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type PlanListProps = { plans: PlanSummaryDto[]; onOpen: (plan: PlanSummaryDto) => void; actionLabel?: string };

/** Test plans by symptom: each row names the symptom, the system and how many steps. */
export function PlanList({ plans, onOpen, actionLabel = 'Open' }: PlanListProps) {
  const t = useTheme();
  return (
    <View style={styles.list} testID="plan-list">
      {plans.map((p) => (
        <Pressable
          key={p.id}
          accessibilityRole="button"
          accessibilityLabel={`${actionLabel}: ${p.title}`}
          onPress={() => onOpen(p)}
          testID={`plan-item-${p.id}`}
        >
          {({ pressed }) => (
            <Card style={pressed ? { backgroundColor: t.surfaceMuted } : undefined}>
              <Text variant="heading">{p.title}</Text>
              <Text>{p.symptom}</Text>
              <Text variant="small" color="textMuted">
                {SYSTEM_LABELS[p.system]} · {p.stepCount} steps · {p.modelTitle ?? 'every model with these parts'}
              </Text>
            </Card>
          )}
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.sm } });
