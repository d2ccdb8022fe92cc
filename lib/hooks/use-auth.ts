/**
 * Account hooks: sign-up, verification, sign-in, passwords, and the admins' user list.
 * Mutations that answer with a session hand it to the SessionProvider, which keeps the
 * access token and schedules its renewal.
 */
import { keepPreviousData, useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import {
  changePassword,
  forgotPassword,
  listUsers,
  resetPassword,
  signIn,
  signOutEverywhere,
  signUp,
  updateUser,
  userAudit,
  verifyEmail,
} from '../api/auth';
import type { RoleValue } from '../contracts/auth';
import { useSession } from '../session/session-provider';

export const USERS_KEY = ['users'] as const;
export const USER_AUDIT_KEY = ['user-audit'] as const;

export function useSignUpMutation() {
  return useMutation({ mutationFn: signUp });
}

export function useVerifyEmailMutation() {
  return useMutation({ mutationFn: verifyEmail });
}

export function useSignInMutation() {
  const session = useSession();
  return useMutation({ mutationFn: signIn, onSuccess: session.start });
}

export function useForgotPasswordMutation() {
  return useMutation({ mutationFn: forgotPassword });
}

export function useResetPasswordMutation() {
  return useMutation({ mutationFn: resetPassword });
}

/** The server revokes every other session and answers with a fresh one for this device. */
export function useChangePasswordMutation() {
  const session = useSession();
  return useMutation({ mutationFn: changePassword, onSuccess: session.start });
}

/** Ends every session of the account, this one included. */
export function useSignOutEverywhereMutation() {
  const session = useSession();
  const qc = useQueryClient();
  return useMutation({
    mutationFn: signOutEverywhere,
    onSuccess: async () => {
      await session.signOut();
      qc.removeQueries({ queryKey: USERS_KEY });
    },
  });
}

export function useUsersQuery(q: string, enabled = true) {
  const text = q.trim();
  return useQuery({
    queryKey: [...USERS_KEY, text],
    queryFn: () => listUsers(text),
    enabled,
    placeholderData: keepPreviousData,
  });
}

export function useUpdateUserMutation() {
  const qc = useQueryClient();
  return useMutation({
    mutationFn: ({ id, ...body }: { id: number; role?: RoleValue; disabled?: boolean }) => updateUser(id, body),
    onSuccess: (user) =>
      Promise.all([
        qc.invalidateQueries({ queryKey: USERS_KEY }),
        qc.invalidateQueries({ queryKey: [...USER_AUDIT_KEY, user.id] }),
      ]),
  });
}

export function useUserAuditQuery(id: number | null) {
  return useQuery({ queryKey: [...USER_AUDIT_KEY, id], queryFn: () => userAudit(id!), enabled: id !== null });
}
