import { View } from 'react-native';
import { cautionsFor } from '@/lib/safety/cautions';
import { Caution } from '../ui/caution';
import { Text } from '../ui/text';

export type SafetyNotesProps = { component: string; parameter: string };

/** The cautions that apply to this component, and the deferral to the maker's manual. */
export function SafetyNotes({ component, parameter }: SafetyNotesProps) {
  const { notes, defer } = cautionsFor(component, parameter);
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
