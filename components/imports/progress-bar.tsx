import { StyleSheet, View } from 'react-native';
import { Radius } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';

export type ProgressBarProps = { label: string; fraction: number; testID?: string };

/** A determinate progress bar (0…1), announced as a progress bar with its percentage. */
export function ProgressBar({ label, fraction, testID }: ProgressBarProps) {
  const t = useTheme();
  const percent = Math.round(Math.min(1, Math.max(0, fraction)) * 100);
  return (
    <View
      accessibilityRole="progressbar"
      accessibilityLabel={label}
      accessibilityValue={{ min: 0, max: 100, now: percent }}
      style={[styles.track, { backgroundColor: t.surfaceMuted, borderColor: t.border }]}
      testID={testID}
    >
      <View style={[styles.fill, { width: `${percent}%`, backgroundColor: t.primary }]} />
    </View>
  );
}

const styles = StyleSheet.create({
  track: { height: 12, borderRadius: Radius.sm, borderWidth: 1, overflow: 'hidden' },
  fill: { height: '100%' },
});
