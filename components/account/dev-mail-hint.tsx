import { Text } from '../ui/text';

/**
 * Development builds only: where the local mail server's messages can be read. The page
 * is served by the API (never in production), so it lives beside the API's base URL.
 */
export function DevMailHint() {
  if (process.env.NODE_ENV === 'production') return null;
  const mailbox = `${process.env.EXPO_PUBLIC_API_URL ?? ''}/dev/mailbox`;
  return (
    <Text variant="small" color="textMuted" testID="dev-mail-hint">
      Development: messages from the local mail server are listed at {mailbox}.
    </Text>
  );
}
