import { useState } from 'react';
import { StyleSheet, View } from 'react-native';
import Svg, { Circle, Defs, Line, Pattern, Rect, Text as SvgText } from 'react-native-svg';
import { bandOf, scale } from '@/lib/calculator/band';
import { formatNumber } from '@/lib/units';
import type { VerdictResult } from '@/lib/verdict';
import { Fonts } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { Text } from '../ui/text';

const HEIGHT = 96;
const AXIS_Y = 52;

/**
 * The tolerance band: the limits, the marginal zones, the reading and its uncertainty
 * interval, coloured by verdict and labelled in words (colour is never the only signal).
 */
export function BandPicture({ result }: { result: VerdictResult }) {
  const t = useTheme();
  const [width, setWidth] = useState(0);
  const band = bandOf(result);
  const x = scale(band, width);
  const verdictColor = { pass: t.pass, marginal: t.marginal, fail: t.fail }[result.verdict];
  const lo = band.lower !== undefined ? x(band.lower) : 0;
  const hi = band.upper !== undefined ? x(band.upper) : width;
  // Limit labels that would overlap are pushed apart: min to the left of its mark, max to the right.
  const crowded = band.lower !== undefined && band.upper !== undefined && hi - lo < 90;
  const interval = band.interval
    ? `, interval ${formatNumber(band.interval[0])} to ${formatNumber(band.interval[1])} ${result.unit}`
    : '';
  const label = `Tolerance band: ${band.lower !== undefined ? `lower limit ${formatNumber(band.lower)}` : 'no lower limit'}, ${band.upper !== undefined ? `upper limit ${formatNumber(band.upper)}` : 'no upper limit'}, reading ${formatNumber(band.value)} ${result.unit}${interval}: ${result.verdict}`;
  return (
    <View
      testID="band-picture"
      accessibilityRole="image"
      accessibilityLabel={label}
      onLayout={(e) => setWidth(e.nativeEvent.layout.width)}
      style={styles.wrap}
    >
      {width > 0 && (
        <Svg width={width} height={HEIGHT}>
          {/* Outside the limits is hatched in the fail colour, inside is plain and outlined in the pass colour:
              the two differ by pattern as well as hue, and each line has > 3:1 against the other zone in both
              schemes (dark: #ff8a80 on #3d1715 and #6fd08a on #3d1715). */}
          <Defs>
            <Pattern id="band-out" patternUnits="userSpaceOnUse" width={8} height={8} patternTransform="rotate(45)">
              <Rect x={0} y={0} width={8} height={8} fill={t.failSurface} />
              <Line x1={0} y1={0} x2={0} y2={8} stroke={t.fail} strokeWidth={3} />
            </Pattern>
          </Defs>
          <Rect x={0} y={AXIS_Y - 10} width={width} height={20} fill="url(#band-out)" />
          <Rect
            x={lo}
            y={AXIS_Y - 10}
            width={Math.max(0, hi - lo)}
            height={20}
            fill={t.passSurface}
            stroke={t.pass}
            strokeWidth={2}
          />
          {band.marginal.map(([a, b]) => (
            <Rect
              key={`${a}-${b}`}
              x={x(a)}
              y={AXIS_Y - 10}
              width={Math.max(1, x(b) - x(a))}
              height={20}
              fill={t.marginalSurface}
              stroke={t.marginal}
              strokeWidth={0.5}
            />
          ))}
          {[band.lower, band.upper].map((limit, i) =>
            limit === undefined ? null : (
              <LimitMark
                key={i}
                at={x(limit)}
                text={`${i === 0 ? 'min' : 'max'} ${formatNumber(limit)}`}
                color={t.text}
                width={width}
                side={crowded ? (i === 0 ? 'left' : 'right') : 'centre'}
              />
            ),
          )}
          {band.interval && (
            <Line
              x1={x(band.interval[0])}
              x2={x(band.interval[1])}
              y1={AXIS_Y}
              y2={AXIS_Y}
              stroke={verdictColor}
              strokeWidth={4}
              strokeLinecap="round"
            />
          )}
          <Circle cx={x(band.value)} cy={AXIS_Y} r={7} fill={verdictColor} stroke={t.surface} strokeWidth={2} />
          <SvgText
            x={clamp(x(band.value), 30, width - 30)}
            y={AXIS_Y + 30}
            fontSize={13}
            fontFamily={Fonts.semibold}
            fill={verdictColor}
            textAnchor="middle"
          >
            {`${formatNumber(band.value)} ${result.unit} · ${result.verdict.toUpperCase()}`}
          </SvgText>
        </Svg>
      )}
      <Text variant="small" color="textMuted">
        Green, plain: inside the limits
        {band.marginal.length
          ? ` · amber: marginal zone${result.expandedUncertainty !== null ? ' (limit ± U)' : ' (near-limit band)'}`
          : ''}{' '}
        · red, hatched: outside
        {band.interval ? ' · bar: reading ± U (k = 2)' : ''}
      </Text>
    </View>
  );
}

type Side = 'left' | 'centre' | 'right';

function LimitMark({
  at,
  text,
  color,
  width,
  side,
}: {
  at: number;
  text: string;
  color: string;
  width: number;
  side: Side;
}) {
  const anchor = side === 'left' ? 'end' : side === 'right' ? 'start' : 'middle';
  const x =
    side === 'left'
      ? Math.max(at - 3, 70)
      : side === 'right'
        ? Math.min(at + 3, width - 70)
        : clamp(at, 28, width - 28);
  return (
    <>
      <Line x1={at} x2={at} y1={AXIS_Y - 16} y2={AXIS_Y + 16} stroke={color} strokeWidth={2} />
      <SvgText x={x} y={AXIS_Y - 22} fontSize={12} fontFamily={Fonts.regular} fill={color} textAnchor={anchor}>
        {text}
      </SvgText>
    </>
  );
}

const clamp = (v: number, lo: number, hi: number) => Math.min(Math.max(v, lo), Math.max(lo, hi));

const styles = StyleSheet.create({ wrap: { width: '100%', gap: 4 } });
