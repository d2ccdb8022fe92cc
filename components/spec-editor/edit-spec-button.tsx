import { StyleSheet } from 'react-native';
import { useRouter } from 'expo-router';
import { useSession } from '@/lib/session/session-provider';
import { Button } from '../ui/button';

/** On the spec card, for editors only: open the spec editor. */
export function EditSpecButton({ specId }: { specId: number }) {
  const router = useRouter();
  const { can } = useSession();
  if (!can('editor')) return null;
  return (
    <Button
      label="Edit this spec"
      variant="secondary"
      onPress={() => router.push(`/editor/specs/${specId}`)}
      style={styles.button}
      testID="edit-spec"
    />
  );
}

const styles = StyleSheet.create({ button: { alignSelf: 'flex-start' } });
