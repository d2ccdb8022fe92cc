/**
 * The signed-in session on the device. The access token lives in memory only; the
 * refresh token is an httpOnly cookie the browser keeps, so a reload restores the
 * session through /api/auth/refresh, and the token is renewed before it expires.
 *
 * Offline (offline-session.ts): a refresh that does not get through keeps the user signed
 * in without a token (`connected: false`) and is retried when the connection returns and
 * every 15 s; only the server refusing it ends the session.
 */
import { createContext, useCallback, useContext, useEffect, useRef, useState, type ReactNode } from 'react';
import { onlineManager, useQueryClient } from '@tanstack/react-query';
import { forgetPrivateQueries } from '../offline/query-persist';
import type { RoleValue, SessionDto, UserDto } from '../contracts/auth';
import { refreshSession, signOut as apiSignOut } from '../api/auth';
import { setAccessToken, setUnauthorizedHandler } from '../api/client';
import { forgetUser, isSessionRefused, rememberUser, rememberedUser } from './offline-session';

type SessionState = {
  status: 'restoring' | 'signed-in' | 'signed-out';
  user: UserDto | null;
  /** Signed in with a token the API accepts; false while the device is offline and the session waits. */
  connected: boolean;
  /** Call with the answer of sign-in, password change or refresh. */
  start: (session: SessionDto) => void;
  signOut: () => Promise<void>;
  can: (role: RoleValue) => boolean;
};

const ORDER: RoleValue[] = ['contributor', 'editor', 'admin'];
const RETRY_MS = 15_000;
const SessionContext = createContext<SessionState | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const [user, setUser] = useState<UserDto | null>(null);
  const [status, setStatus] = useState<SessionState['status']>('restoring');
  const [connected, setConnected] = useState(false);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const renewRef = useRef<() => Promise<void>>(async () => undefined);

  const end = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    setAccessToken(null);
    setUser(null);
    setConnected(false);
    setStatus('signed-out');
    void forgetUser();
  }, []);

  const start = useCallback(function start(session: SessionDto) {
    setAccessToken(session.accessToken);
    setUser(session.user);
    setConnected(true);
    setStatus('signed-in');
    void rememberUser(session.user);
    if (timer.current) clearTimeout(timer.current);
    // Renew a minute before the access token expires.
    timer.current = setTimeout(() => void renewRef.current(), Math.max(10, session.expiresIn - 60) * 1000);
  }, []);

  /** Refresh; on a network fault keep (or restore) the remembered user and wait for the signal. */
  const renew = useCallback(
    async function renew() {
      try {
        start(await refreshSession());
      } catch (err) {
        if (isSessionRefused(err)) return end();
        const kept = await rememberedUser();
        if (!kept) return end();
        setAccessToken(null);
        setUser(kept);
        setConnected(false);
        setStatus('signed-in');
        if (timer.current) clearTimeout(timer.current);
        timer.current = setTimeout(() => void renew(), RETRY_MS);
      }
    },
    [start, end],
  );

  useEffect(() => {
    renewRef.current = renew;
    void renew();
    setUnauthorizedHandler(end);
    return () => {
      if (timer.current) clearTimeout(timer.current);
    };
  }, [renew, end]);

  // Back online with a session waiting: resume it at once, without a reload.
  useEffect(() => {
    if (connected || status !== 'signed-in') return;
    return onlineManager.subscribe((online) => {
      if (online) void renew();
    });
  }, [connected, status, renew]);

  const queryClient = useQueryClient();
  // A shared workshop tablet: the next person must not find this one's job sheets kept offline.
  const signOut = async () => {
    await apiSignOut().catch(() => undefined);
    end();
    forgetPrivateQueries(queryClient);
  };
  const can = (role: RoleValue) => !!user && ORDER.indexOf(user.role) >= ORDER.indexOf(role);

  return (
    <SessionContext.Provider value={{ status, user, connected, start, signOut, can }}>
      {children}
    </SessionContext.Provider>
  );
}

export function useSession(): SessionState {
  const s = useContext(SessionContext);
  if (!s) throw new Error('useSession must be used inside SessionProvider');
  return s;
}
