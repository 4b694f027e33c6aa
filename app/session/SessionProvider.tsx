/** The session in React: a context, a narrow subscribed view, and Dexie live queries. */
import { liveQuery } from 'dexie';
import { createContext, useContext, useEffect, useState, type ReactNode } from 'react';
import { useStore } from 'zustand';
import type { Session, SessionState } from './session.ts';

const SessionContext = createContext<Session | null>(null);

export function SessionProvider({ session, children }: { session: Session; children: ReactNode }) {
  return <SessionContext.Provider value={session}>{children}</SessionContext.Provider>;
}

export function useSession(): Session {
  const session = useContext(SessionContext);
  if (session === null) throw new Error('useSession outside <SessionProvider>');
  return session;
}

export function useSessionState<T>(selector: (state: SessionState) => T): T {
  return useStore(useSession().state, selector);
}

/** The value of a query over the database, kept current as any tab changes what it reads. */
export function useLive<T>(
  query: (() => Promise<T>) | null,
  deps: readonly unknown[],
): { value: T | undefined; error: string | null } {
  const [state, setState] = useState<{ value: T | undefined; error: string | null }>({ value: undefined, error: null });
  useEffect(() => {
    if (query === null) return undefined;
    const subscription = liveQuery(query).subscribe({
      next: (value) => setState({ value, error: null }),
      error: (error: unknown) =>
        setState((s) => ({ value: s.value, error: error instanceof Error ? error.message : String(error) })),
    });
    return () => subscription.unsubscribe();
    // biome-ignore lint/correctness/useExhaustiveDependencies: the caller names what the query depends on: the query itself is a new closure every render.
  }, deps);
  return state;
}
