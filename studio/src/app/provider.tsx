import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { createQueryClient } from '@/lib/query-client';
import { useForgetSessionOnUnauthorized } from '@/lib/session';
import { theme } from '@/theme/theme';

/** Forgets the session when the API answers 401, so guarded pages send the person to sign in. */
function SessionWatcher() {
  useForgetSessionOnUnauthorized();
  return null;
}

export function AppProvider({ children }: { children: ReactNode }) {
  const [queryClient] = useState(createQueryClient);
  return (
    <MantineProvider theme={theme} defaultColorScheme="light">
      <Notifications position="top-right" />
      <QueryClientProvider client={queryClient}>
        <SessionWatcher />
        {children}
      </QueryClientProvider>
    </MantineProvider>
  );
}
