import { Pressable, StyleSheet, View } from 'react-native';
import type { RunDto } from '@/lib/contracts/plans';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type RunListProps = { runs: RunDto[]; onOpen: (run: RunDto) => void };

/** A job's plan runs: open ones can be resumed (on any device), concluded ones show their finding. */
export function RunList({ runs, onOpen }: RunListProps) {
  return (
    <View style={styles.list} testID="run-list">
      <Text variant="label">Test plans on this job</Text>
      {runs.map((r) => (
        <Pressable
          key={r.id}
          accessibilityRole="button"
          accessibilityLabel={`${r.status === 'active' ? 'Resume' : 'Open'}: ${r.title}`}
          onPress={() => onOpen(r)}
        >
          <Card>
            <Text variant="heading">{r.title}</Text>
            <Text variant="small" color="textMuted">
              {r.status === 'active'
                ? `In progress: step ${(r.currentStep?.position ?? 0) + 1} of ${r.stepCount} — ${r.currentStep?.title ?? ''}`
                : `Finding: ${r.finding?.part ?? '—'}`}
            </Text>
          </Card>
        </Pressable>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ list: { gap: Spacing.sm } });
