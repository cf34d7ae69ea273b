import '@mantine/core/styles.css';
import '@mantine/notifications/styles.css';
import { MantineProvider } from '@mantine/core';
import { Notifications } from '@mantine/notifications';
import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { useResetCacheOnSessionChange } from '../lib/session/use-reset-cache-on-session-change';
import { theme } from './theme';

interface AppProvidersProps {
  queryClient: QueryClient;
  /** 'test' turns off transitions and portals' delays under jsdom. */
  env?: 'default' | 'test';
  children: ReactNode;
}

function SessionCacheReset() {
  useResetCacheOnSessionChange();
  return null;
}

/** Theme, data cache and notifications around the whole app. */
export function AppProviders({ queryClient, env = 'default', children }: AppProvidersProps) {
  return (
    <MantineProvider theme={theme} defaultColorScheme="auto" env={env}>
      <QueryClientProvider client={queryClient}>
        <SessionCacheReset />
        <Notifications position="top-right" limit={4} />
        {children}
      </QueryClientProvider>
    </MantineProvider>
  );
}
