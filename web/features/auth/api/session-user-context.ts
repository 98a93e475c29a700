import { createContext } from 'react';
import type { SessionUser } from '#shared/schemas/auth';

/**
 * The signed-in person, provided by RequireSession. Screens read it from here rather than
 * from the session query, so when the session ends they are unmounted by RequireSession
 * instead of rendering once more without a person.
 */
export const SessionUserContext = createContext<SessionUser | null>(null);
