import { Link, Stack } from 'expo-router';
import { Screen } from '@/components/ui/screen';
import { Text } from '@/components/ui/text';

export default function NotFoundScreen() {
  return (
    <Screen testID="not-found-screen">
      <Stack.Screen options={{ title: 'Not found' }} />
      <Text variant="title">This page does not exist</Text>
      <Link href="/" accessibilityRole="link">
        <Text color="primary">Back to search</Text>
      </Link>
    </Screen>
  );
}
