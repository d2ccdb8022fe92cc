/**
 * The session's offline part. The access token never leaves memory; what the device keeps
 * is who was signed in (id, name, role: no secret), so a reload with no signal still knows
 * the user, shows their kept jobs and queues their readings. A refresh that fails for lack
 * of network (or a server fault) is not a sign-out: only the server's 401 ends a session.
 */
import AsyncStorage from '@react-native-async-storage/async-storage';
import { ApiError } from '../api/client';
import type { UserDto } from '../contracts/auth';

export const SESSION_USER_KEY = 'specbench.session-user.v1';

/** True when the refresh was refused (the session is over); false when it simply did not get through. */
export function isSessionRefused(err: unknown): boolean {
  return err instanceof ApiError && err.status >= 400 && err.status < 500 && err.status !== 408 && err.status !== 429;
}

export async function rememberUser(user: UserDto): Promise<void> {
  await AsyncStorage.setItem(SESSION_USER_KEY, JSON.stringify(user)).catch(() => undefined);
}

export async function forgetUser(): Promise<void> {
  await AsyncStorage.removeItem(SESSION_USER_KEY).catch(() => undefined);
}

export async function rememberedUser(): Promise<UserDto | null> {
  try {
    const raw = JSON.parse((await AsyncStorage.getItem(SESSION_USER_KEY)) ?? 'null') as UserDto | null;
    return raw && typeof raw.id === 'number' && typeof raw.role === 'string' ? raw : null;
  } catch {
    return null;
  }
}
