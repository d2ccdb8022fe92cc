import { useRouter } from 'expo-router';
import { Button } from '../ui/button';
import { Card } from '../ui/card';
import { Text } from '../ui/text';

export type SignInPromptProps = { message?: string };

/** Shown instead of job sheets to someone who is not signed in. */
export function SignInPrompt({
  message = 'Job sheets keep the readings of each machine you work on, with their verdicts, ready to print for the customer.',
}: SignInPromptProps) {
  const router = useRouter();
  return (
    <Card testID="jobs-sign-in">
      <Text variant="heading">Sign in to keep job sheets</Text>
      <Text color="textMuted">{message}</Text>
      <Button label="Sign in" onPress={() => router.push('/sign-in')} />
    </Card>
  );
}
