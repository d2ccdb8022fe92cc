import { Stack } from 'expo-router';
import { HeaderBack } from '@/components/ui/app-header';
import { useHeaderOptions } from '@/lib/theme/use-header-options';

/**
 * The sign-in pages. The group keeps their URLs short (/sign-in, /verify …); the root
 * stack hides its own header for the group, so this stack draws the one header, with
 * the root's back button when the group was opened from another page.
 */
export default function AuthLayout() {
  const header = useHeaderOptions();
  return (
    <Stack
      screenOptions={{
        ...header,
        // Each page names itself in its card; `title` still names the browser tab.
        headerTitle: 'Specbench',
        headerLeft: () => <HeaderBack />,
      }}
    >
      <Stack.Screen name="sign-in" options={{ title: 'Sign in' }} />
      <Stack.Screen name="sign-up" options={{ title: 'Create an account' }} />
      <Stack.Screen name="verify" options={{ title: 'Confirm e-mail address' }} />
      <Stack.Screen name="forgot" options={{ title: 'Forgotten password' }} />
      <Stack.Screen name="reset" options={{ title: 'New password' }} />
    </Stack>
  );
}
