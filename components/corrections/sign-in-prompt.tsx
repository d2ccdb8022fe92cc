import { View } from 'react-native';
import { useRouter } from 'expo-router';
import { Button } from '../ui/button';
import { Text } from '../ui/text';

/** Shown in place of a screen that needs an account. */
export function SignInPrompt({ reason }: { reason: string }) {
  const router = useRouter();
  return (
    <View style={{ gap: 12, alignItems: 'flex-start' }} testID="sign-in-prompt">
      <Text variant="heading">Sign in {reason}</Text>
      <Text color="textMuted">
        Any technician can create an account; new accounts may propose corrections and keep job sheets.
      </Text>
      <Button label="Sign in" onPress={() => router.push('/sign-in')} />
    </View>
  );
}
