import { QueryClientProvider, type QueryClient } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { SessionControlProvider, type SessionControl } from './session-control';

export interface AppProvidersProps {
  queryClient: QueryClient;
  sessionControl: SessionControl;
  children: ReactNode;
}

export function AppProviders({ queryClient, sessionControl, children }: AppProvidersProps) {
  return (
    <QueryClientProvider client={queryClient}>
      <SessionControlProvider control={sessionControl}>{children}</SessionControlProvider>
    </QueryClientProvider>
  );
}
