import { useState, type ReactNode } from 'react';
import { QueryClientProvider } from '@tanstack/react-query';
import { authKeys } from '../features/auth/api/auth-keys';
import { ToastProvider } from '../components/ui/toast-region';
import { createQueryClient } from '../lib/query-client';

export function Providers({ children }: { children: ReactNode }) {
  const [client] = useState(() => {
    // A 401 on any query means the session ended (expired, signed out elsewhere): forget the
    // person, and RequireSession sends them to sign in with a way back.
    const qc = createQueryClient(() => qc.setQueryData(authKeys.session(), null));
    return qc;
  });
  return (
    <QueryClientProvider client={client}>
      <ToastProvider>{children}</ToastProvider>
    </QueryClientProvider>
  );
}
