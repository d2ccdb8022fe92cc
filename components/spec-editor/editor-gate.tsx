import type { ReactNode } from 'react';
import { useSession } from '@/lib/session/session-provider';
import { SignInPrompt } from '../corrections/sign-in-prompt';
import { EmptyState, LoadingState } from '../ui/states';

export type EditorGateProps = { reason: string; children: ReactNode };

/**
 * Editor screens: a sign-in prompt when signed out, "Editors only" for other roles. The
 * server refuses these routes anyway; this only spares a form that cannot be sent.
 */
export function EditorGate({ reason, children }: EditorGateProps) {
  const { status, can } = useSession();
  if (status === 'restoring') return <LoadingState label="Checking your account" />;
  if (status === 'signed-out') return <SignInPrompt reason={reason} />;
  if (!can('editor'))
    return (
      <EmptyState message="Editors only: your account can read specs and propose corrections, but not change the library." />
    );
  return <>{children}</>;
}
