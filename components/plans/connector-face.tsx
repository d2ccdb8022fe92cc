import { StyleSheet, View } from 'react-native';
import Svg, { Circle, G, Rect, Text as SvgText } from 'react-native-svg';
import type { ConnectorDto } from '@/lib/contracts/plans';
import { connectorCells } from '@/lib/plans/connector';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

export type ConnectorFaceProps = { connector: ConnectorDto; probe: number[]; title: string };

const CELL = 44;
const PAD = 14;

/**
 * A connector face drawn as seen from its `view` side, with the probed pins highlighted.
 * Colour is never the only signal: every pin shows its number, probed pins get a thick ring
 * and a probe mark, and the legend below names each probed pin and its wire.
 */
export function ConnectorFace({ connector, probe, title }: ConnectorFaceProps) {
  const t = useTheme();
  const cells = connectorCells(connector);
  const w = connector.columns * CELL + PAD * 2;
  const h = connector.rows * CELL + PAD * 2;
  const key = {
    top: [w / 2 - 12, 0, 24, 8],
    bottom: [w / 2 - 12, h - 8, 24, 8],
    left: [0, h / 2 - 12, 8, 24],
    right: [w - 8, h / 2 - 12, 8, 24],
  }[connector.key];
  const probed = connector.pins.filter((p) => probe.includes(p.number));
  return (
    <View style={styles.wrap} testID="connector-face">
      <Text variant="label">{title}</Text>
      <Text variant="small" color="textMuted">
        Looking into the {connector.view} side · key at the {connector.key} · pin 1 at the{' '}
        {connector.numbering === 'left-to-right' ? 'top left' : 'top right'}
      </Text>
      <Svg width={w} height={h} accessibilityLabel={`Connector face, probe pins ${probe.join(' and ')}`}>
        <Rect x={2} y={2} width={w - 4} height={h - 4} rx={8} fill={t.surfaceMuted} stroke={t.border} strokeWidth={2} />
        <Rect x={key[0]} y={key[1]} width={key[2]} height={key[3]} fill={t.text} />
        {cells.map((c) => {
          const on = probe.includes(c.number);
          const cx = PAD + c.column * CELL + CELL / 2;
          const cy = PAD + c.row * CELL + CELL / 2;
          return (
            <G key={c.number}>
              <Circle
                cx={cx}
                cy={cy}
                r={15}
                fill={on ? t.primary : t.surface}
                stroke={on ? t.text : t.border}
                strokeWidth={on ? 4 : 1.5}
              />
              <SvgText
                x={cx}
                y={cy + 5}
                fontSize={14}
                fontWeight="bold"
                textAnchor="middle"
                fill={on ? t.primaryText : t.text}
              >
                {on ? `▶${c.number}` : String(c.number)}
              </SvgText>
            </G>
          );
        })}
      </Svg>
      {probed.map((p) => (
        <Text key={p.number} variant="small" testID={`probe-pin-${p.number}`}>
          ▶ Pin {p.number}: {p.name}
          {p.wire ? ` (${p.wire} wire)` : ''}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({ wrap: { gap: Spacing.xs } });
