/**
 * The signed-in session on the device. The access token lives in memory only; the
 * refresh token is an httpOnly cookie the browser keeps, so a reload restores the
 * session through /api/auth/refresh, and the token is renewed before it expires.
 */
import { createContext, useCallback, useContext, useEffect, useRef, useState, type ReactNode } from 'react';
import type { RoleValue, SessionDto, UserDto } from '../contracts/auth';
import { refreshSession, signOut as apiSignOut } from '../api/auth';
import { setAccessToken, setUnauthorizedHandler } from '../api/client';

type SessionState = {
  status: 'restoring' | 'signed-in' | 'signed-out';
  user: UserDto | null;
  /** Call with the answer of sign-in, password change or refresh. */
  start: (session: SessionDto) => void;
  signOut: () => Promise<void>;
  can: (role: RoleValue) => boolean;
};

const ORDER: RoleValue[] = ['contributor', 'editor', 'admin'];
const SessionContext = createContext<SessionState | null>(null);

export function SessionProvider({ children }: { children: ReactNode }) {
  const [user, setUser] = useState<UserDto | null>(null);
  const [status, setStatus] = useState<SessionState['status']>('restoring');
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);

  const end = useCallback(() => {
    if (timer.current) clearTimeout(timer.current);
    setAccessToken(null);
    setUser(null);
    setStatus('signed-out');
  }, []);

  const start = useCallback(
    function start(session: SessionDto) {
      setAccessToken(session.accessToken);
      setUser(session.user);
      setStatus('signed-in');
      if (timer.current) clearTimeout(timer.current);
      // Renew a minute before the access token expires.
      timer.current = setTimeout(
        () => {
          refreshSession().then(start).catch(end);
        },
        Math.max(10, session.expiresIn - 60) * 1000,
      );
    },
    [end],
  );

  useEffect(() => {
    refreshSession().then(start).catch(end);
    setUnauthorizedHandler(end);
    return () => {
      if (timer.current) clearTimeout(timer.current);
    };
  }, [start, end]);

  const signOut = async () => {
    await apiSignOut().catch(() => undefined);
    end();
  };
  const can = (role: RoleValue) => !!user && ORDER.indexOf(user.role) >= ORDER.indexOf(role);

  return <SessionContext.Provider value={{ status, user, start, signOut, can }}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionState {
  const s = useContext(SessionContext);
  if (!s) throw new Error('useSession must be used inside SessionProvider');
  return s;
}
