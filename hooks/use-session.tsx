import { useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';
import type { PublicUser, SignIn, SignInResponse } from '@/shared/schemas/auth';
import { apiRequest, configureApiClient } from './api-client';
import { readStoredSession, writeStoredSession } from './token-storage';

interface Session {
  token: string;
  user: PublicUser;
}

interface SessionValue {
  session: Session | null;
  /** False until the stored session has been read (avoids a flash of the sign-in screen). */
  ready: boolean;
  signIn(input: SignIn): Promise<void>;
  signOut(): void;
  /** Replaces the signed-in user's details after an edit (name, password). */
  updateUser(user: PublicUser): void;
}

const SessionContext = createContext<SessionValue | null>(null);

function parseStored(raw: string | null): Session | null {
  if (!raw) return null;
  try {
    const value = JSON.parse(raw) as Session;
    return typeof value?.token === 'string' && value.user ? value : null;
  } catch {
    return null;
  }
}

export function SessionProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [session, setSession] = useState<Session | null>(null);
  const [ready, setReady] = useState(false);

  const store = useCallback((next: Session | null) => {
    configureApiClient({ token: next?.token ?? null });
    writeStoredSession(next ? JSON.stringify(next) : null);
    setSession(next);
  }, []);

  const signOut = useCallback(() => {
    store(null);
    queryClient.clear();
  }, [queryClient, store]);

  useEffect(() => {
    configureApiClient({ token: null, onUnauthorized: signOut });
    const stored = parseStored(readStoredSession());
    store(stored);
    setReady(true);
    if (stored) {
      // Refresh the role and name from the server; a 401 here signs out through onUnauthorized.
      apiRequest<{ user: PublicUser }>('/auth/me')
        .then(({ user }) => store({ token: stored.token, user }))
        .catch(() => undefined);
    }
  }, [signOut, store]);

  const signIn = useCallback(
    async (input: SignIn) => {
      const result = await apiRequest<SignInResponse>('/auth/sign-in', { method: 'POST', body: input, skipAuthRedirect: true });
      queryClient.clear();
      store({ token: result.token, user: result.user });
    },
    [queryClient, store],
  );

  const updateUser = useCallback((user: PublicUser) => {
    setSession((current) => {
      if (!current) return current;
      const next = { token: current.token, user };
      writeStoredSession(JSON.stringify(next));
      return next;
    });
  }, []);

  const value = useMemo(() => ({ session, ready, signIn, signOut, updateUser }), [session, ready, signIn, signOut, updateUser]);
  return <SessionContext.Provider value={value}>{children}</SessionContext.Provider>;
}

export function useSession(): SessionValue {
  const value = useContext(SessionContext);
  if (!value) throw new Error('useSession must be used inside SessionProvider');
  return value;
}

/** The signed-in user; only for screens inside the signed-in group. */
export function useCurrentUser(): PublicUser {
  const { session } = useSession();
  if (!session) throw new Error('useCurrentUser used while signed out');
  return session.user;
}
