import { useContext } from 'react';
import type { SessionUser } from '#shared/schemas/auth';
import { SessionUserContext } from './session-user-context';

/** The signed-in person, for screens under RequireSession (which guarantees there is one). */
export function useCurrentUser(): SessionUser {
  const user = useContext(SessionUserContext);
  if (!user) throw new Error('useCurrentUser used outside RequireSession');
  return user;
}
