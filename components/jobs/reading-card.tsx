import { StyleSheet, View } from 'react-native';
import type { ReadingDto } from '@/lib/contracts/jobs';
import { Radius, Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { BandPicture } from '../calculator/band-picture';
import { Button } from '../ui/button';
import { Text } from '../ui/text';
import { asVerdictResult, formatWhen, inputLines, isCheck, resultText } from './job-format';
import { VerdictChip } from './verdict-chip';

export type ReadingCardProps = { reading: ReadingDto; onRetake?: () => void };

/** One reading on the job sheet: verdict in words, the band, the reading as typed, its time and warnings. */
export function ReadingCard({ reading: r, onRetake }: ReadingCardProps) {
  const t = useTheme();
  const retaken = r.supersededBy !== null;
  const strike = retaken ? styles.struck : null;
  return (
    <View testID={`job-reading-${r.id}`} style={[styles.card, { borderTopColor: t.border }]}>
      <View style={styles.top}>
        <Text variant="label" style={[styles.grow, strike]}>
          {r.label}
        </Text>
        {retaken ? (
          <Text variant="small" color="textMuted" testID="reading-retaken">
            re-taken
          </Text>
        ) : null}
        <VerdictChip verdict={r.verdict} muted={retaken} testID="reading-verdict" />
      </View>
      <Text variant="value" style={strike} color={retaken ? 'textMuted' : 'text'}>
        {resultText(r)}
      </Text>
      {retaken || isCheck(r) ? null : <BandPicture result={asVerdictResult(r)} />}
      <Text variant="small" style={strike}>
        {r.reason}
      </Text>
      <Text variant="small" color="textMuted">
        {[...inputLines(r.inputs), `Taken ${formatWhen(r.takenAt)}`].join(' · ')}
      </Text>
      {r.specChangedSince && !retaken ? (
        <View
          style={[styles.warning, { backgroundColor: t.cautionSurface, borderColor: t.cautionBorder }]}
          testID="spec-changed"
        >
          <Text variant="small" color="caution">
            Spec changed since this reading: the library’s limits were edited after it was judged. Re-take it against
            the current spec.
          </Text>
        </View>
      ) : null}
      {onRetake && !retaken ? (
        <Button
          label="Re-take"
          variant="secondary"
          onPress={onRetake}
          style={styles.retake}
          accessibilityLabel={`Re-take ${r.label}`}
          testID="reading-retake"
        />
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { borderTopWidth: StyleSheet.hairlineWidth, paddingTop: Spacing.md, gap: Spacing.xs },
  top: { flexDirection: 'row', alignItems: 'center', gap: Spacing.sm },
  grow: { flex: 1 },
  struck: { textDecorationLine: 'line-through' },
  warning: { borderWidth: 1, borderRadius: Radius.md, padding: Spacing.sm },
  retake: { alignSelf: 'flex-start', minHeight: 40 },
});
