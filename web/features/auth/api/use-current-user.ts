import { useQuery } from '@tanstack/react-query';
import type { SessionUser } from '#shared/schemas/auth';
import { sessionQueryOptions } from './session-query';

/** The signed-in person, for screens under RequireSession (which guarantees there is one). */
export function useCurrentUser(): SessionUser {
  const { data } = useQuery(sessionQueryOptions());
  if (!data) throw new Error('useCurrentUser used outside a signed-in area');
  return data;
}
