import { StyleSheet, View } from 'react-native';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

/** The closing note of every report: what the verdicts are, and what they are not. */
export function LiabilityNote() {
  const t = useTheme();
  return (
    <View testID="report-liability" style={[styles.box, { borderColor: t.border }]}>
      <Text variant="label">Safety and liability</Text>
      <Text variant="small">
        The verdicts in this report assist the technician. They do not replace the maker’s service procedures and
        service manual, nor local codes and regulations. Each reading was judged against the limits and the source shown
        beside it; check them against the current edition of the maker’s manual before replacing parts or returning the
        machine to service.
      </Text>
      <Text variant="small">
        Ignition and charging systems can hurt people: high secondary voltage, fuel vapour near sparks, battery gases.
        Follow the maker’s safety instructions.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { borderWidth: 1, borderRadius: Radius.md, padding: Spacing.md, gap: Spacing.xs },
});
