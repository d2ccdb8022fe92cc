import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';
import type { ImportProblemDto, ImportRowDto } from '@/lib/contracts/imports';
import { Spacing } from '@/lib/theme';
import { useTheme } from '@/lib/theme/use-theme';
import { LinkRow } from '../ui/link-row';
import { Text } from '../ui/text';

const years = (r: ImportRowDto) => `${r.yearFrom}–${r.yearTo ?? ''}`;

/** One accepted row: its line, where it belongs, the parameter and the limits; a link once it has a spec. */
export function ImportRow({
  row,
  onOpenSpec,
  children,
}: {
  row: ImportRowDto;
  onOpenSpec?: (id: number) => void;
  children?: ReactNode;
}) {
  const t = useTheme();
  const title = `${row.make} ${row.model} (${years(row)}${row.variant ? `, ${row.variant}` : ''})`;
  return (
    <View style={[styles.row, { borderTopColor: t.border }]} testID={`import-line-${row.line}`}>
      <View style={styles.head}>
        <Text variant="label" style={styles.line}>
          Line {row.line}
        </Text>
        <View style={styles.body}>
          <Text variant="small" color="textMuted">
            {title} · {row.component}
          </Text>
          <Text variant="small">
            {row.parameter}: <Text variant="label">{row.display}</Text>
          </Text>
        </View>
        {row.specId && onOpenSpec ? (
          <LinkRow
            href={`/specs/${row.specId}`}
            accessibilityLabel={`Open the spec from line ${row.line}`}
            onPress={() => onOpenSpec(row.specId!)}
            style={styles.link}
            testID={`open-spec-line-${row.line}`}
          >
            <Text variant="label" color="primary">
              Open
            </Text>
          </LinkRow>
        ) : null}
      </View>
      {children}
    </View>
  );
}

/** A rejected line or a warning: line, column and the plain reason. */
export function ProblemRow({ problem }: { problem: ImportProblemDto }) {
  const t = useTheme();
  return (
    <View style={[styles.row, styles.head, { borderTopColor: t.border }]}>
      <Text variant="label" style={styles.line}>
        Line {problem.line}
      </Text>
      <View style={styles.body}>
        {problem.column ? (
          <Text variant="small" color="textMuted">
            Column {problem.column}
          </Text>
        ) : null}
        <Text variant="small">{problem.reason}</Text>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  row: { borderTopWidth: StyleSheet.hairlineWidth, paddingVertical: Spacing.xs, gap: Spacing.xs },
  head: { flexDirection: 'row', gap: Spacing.sm, alignItems: 'flex-start' },
  line: { width: 64 },
  body: { flex: 1, minWidth: 0, gap: 2 },
  // 44 × 44 px at least (WCAG 2.5.8 asks 24; 44 is the platforms' own guideline for touch).
  link: { minHeight: 44, minWidth: 44, alignItems: 'center', justifyContent: 'center', paddingHorizontal: Spacing.sm },
});
