import { StyleSheet, View } from 'react-native';
import type { ModelDetailDto } from '@/lib/contracts/library';
import { SYSTEM_LABELS, type PlanSummaryDto } from '@/lib/contracts/plans';
import type { SystemOrOther } from '@/lib/specs/systems';
import { Spacing } from '@/lib/theme';
import { ComponentSpecs } from '../library/component-specs';
import { Text } from '../ui/text';
import { PlanList } from './plan-list';

export type SystemSectionProps = {
  system: SystemOrOther;
  components: ModelDetailDto['components'];
  plans: PlanSummaryDto[];
  wide: boolean;
  onOpenSpec: (id: number) => void;
  onOpenPlan: (plan: PlanSummaryDto) => void;
};

/** One system of a model sheet: the test plans that apply first, then its components and their specs. */
export function SystemSection({ system, components, plans, wide, onOpenSpec, onOpenPlan }: SystemSectionProps) {
  return (
    <View style={styles.section} testID={`system-${system}`}>
      <Text variant="heading" accessibilityRole="header">
        {system === 'other' ? 'Other' : SYSTEM_LABELS[system]}
      </Text>
      {plans.length ? <PlanList plans={plans} onOpen={onOpenPlan} actionLabel="Test plan" /> : null}
      <View style={[styles.grid, wide && styles.gridWide]}>
        {components.map((c) => (
          <View key={c.id} style={wide ? styles.cellWide : undefined}>
            <ComponentSpecs component={c} onOpenSpec={onOpenSpec} />
          </View>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  section: { gap: Spacing.sm },
  grid: { gap: Spacing.md },
  gridWide: { flexDirection: 'row', flexWrap: 'wrap' },
  cellWide: { width: '49%', flexGrow: 1 },
});
