import { StyleSheet, View } from 'react-native';
import type { SpecDetailDto } from '@/lib/contracts/library';
import { formatQuantity } from '@/lib/units';
import { Spacing } from '@/lib/theme';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

const LABELS = { min: 'Minimum', nominal: 'Nominal', max: 'Maximum' } as const;

/** The limits, the conditions and the test points of one spec. */
export function SpecValues({ spec }: { spec: SpecDetailDto }) {
  const unit = spec.unit;
  const limits = (['min', 'nominal', 'max'] as const).filter((k) => spec[k] !== null);
  return (
    <Card testID="spec-values">
      <Text variant="small" color="textMuted">
        {spec.component.name}
      </Text>
      <Text variant="heading">{spec.parameter}</Text>
      <Text variant="title" testID="spec-display">
        {spec.display}
      </Text>
      <View style={styles.limits}>
        {limits.map((k) => (
          <View key={k} style={styles.limit}>
            <Text variant="small" color="textMuted">
              {LABELS[k]}
            </Text>
            <Text variant="label">{formatQuantity(spec[k] as number, unit)}</Text>
          </View>
        ))}
      </View>
      <Detail label="Test points" value={spec.testPoints} />
      <Detail label="Conditions" value={spec.conditions} />
      <Detail label="Reference temperature" value={spec.refTempC === null ? null : `${spec.refTempC} °C`} />
      <Detail
        label="Winding"
        value={spec.material === 'copper' ? 'Copper (resistance corrected for temperature)' : null}
      />
      <Detail label="Notes" value={spec.notes} />
    </Card>
  );
}

function Detail({ label, value }: { label: string; value: string | null }) {
  if (!value) return null;
  return (
    <View style={styles.detail}>
      <Text variant="small" color="textMuted">
        {label}
      </Text>
      <Text>{value}</Text>
    </View>
  );
}

const styles = StyleSheet.create({
  limits: { flexDirection: 'row', gap: Spacing.xl, flexWrap: 'wrap' },
  limit: { gap: 2 },
  detail: { gap: 2 },
});
