import { View } from 'react-native';
import { cautionsOf } from '@/lib/safety/cautions';
import type { CautionCategory } from '@/lib/specs/classify';
import { Caution } from '../ui/caution';
import { Text } from '../ui/text';

/** The categories come from lib/specs/classify.ts (cautionCategories for a spec, cautionCategoriesForMode for the calculator). */
export type SafetyNotesProps = { categories: readonly CautionCategory[] };

/** The cautions that apply to this work, and the deferral to the maker's manual. */
export function SafetyNotes({ categories }: SafetyNotesProps) {
  const { notes, defer } = cautionsOf(categories);
  return (
    <View testID="safety-notes" style={{ gap: 8 }}>
      {notes.map((n) => (
        <Caution key={n.id} title={n.title} lines={n.lines} testID={`caution-${n.id}`} />
      ))}
      <Text variant="small" color="textMuted">
        {defer}
      </Text>
    </View>
  );
}
