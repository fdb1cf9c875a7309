import { QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { meKeys } from '../features/auth/api/me';
import { createQueryClient } from '../lib/query-client';

// Any query answered 401 means the session ended (expired, or signed out elsewhere). Refetching
// `me` turns that into one redirect to sign-in from the app frame, instead of an error per widget.
const queryClient = createQueryClient({
  onUnauthenticated: (queryKey) => {
    if (queryKey[0] !== meKeys.all[0]) void queryClient.invalidateQueries({ queryKey: meKeys.all });
  },
});

export function Providers({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}
