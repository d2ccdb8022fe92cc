import { useRouter } from 'expo-router';
import { useSession } from '@/lib/session/session-provider';
import { Button } from '../ui/button';

/** The editors' entry points, placed in the home screen's button row; nothing for other roles. */
export function EditorActions() {
  const router = useRouter();
  const { can } = useSession();
  if (!can('editor')) return null;
  return (
    <>
      <Button
        label="Import CSV"
        variant="secondary"
        onPress={() => router.push('/editor/import')}
        testID="home-import"
      />
      <Button
        label="New spec"
        variant="secondary"
        onPress={() => router.push('/editor/specs/new')}
        testID="home-new-spec"
      />
      <Button
        label="Edit test plans"
        variant="secondary"
        onPress={() => router.push('/editor/plans')}
        testID="home-edit-plans"
      />
    </>
  );
}
