import type { ReactElement } from 'react';
import { Screen } from '@/components/ui/screen';
import { EmptyState, ErrorState, LoadingState } from '@/components/ui/states';
import { ApiError } from '@/lib/api/client';
import { describeError } from '@/lib/api/describe-error';
import type { useSession } from '@/lib/session/session-provider';
import { SignInPrompt } from './sign-in-prompt';

export type JobGateProps = {
  sessionStatus: ReturnType<typeof useSession>['status'];
  validId: boolean;
  query: { isPending: boolean; fetchStatus?: string; error: unknown; refetch: () => unknown };
  loadingLabel: string;
  testID: string;
};

const jobError = (err: unknown) =>
  err instanceof ApiError && err.status === 404 ? 'There is no job with this number among yours.' : describeError(err);

/**
 * The states a job screen shows before it has its job: the session being restored, a
 * sign-in prompt, a bad address, loading and error. Null once the job is there.
 */
export function jobGate({ sessionStatus, validId, query, loadingLabel, testID }: JobGateProps): ReactElement | null {
  if (sessionStatus === 'restoring')
    return (
      <Screen>
        <LoadingState label="Checking your session" />
      </Screen>
    );
  if (sessionStatus !== 'signed-in')
    return (
      <Screen testID={testID}>
        <SignInPrompt />
      </Screen>
    );
  if (!validId)
    return (
      <Screen>
        <ErrorState message="This address does not name a job." />
      </Screen>
    );
  if (query.isPending && query.fetchStatus === 'paused')
    return (
      <Screen>
        <EmptyState message="Offline — this is not saved on this device yet. It loads when the connection returns." />
      </Screen>
    );
  if (query.isPending)
    return (
      <Screen>
        <LoadingState label={loadingLabel} />
      </Screen>
    );
  if (query.error)
    return (
      <Screen>
        <ErrorState message={jobError(query.error)} onRetry={query.refetch} />
      </Screen>
    );
  return null;
}
