import CssBaseline from '@mui/material/CssBaseline';
import { ThemeProvider } from '@mui/material/styles';
import { QueryClientProvider } from '@tanstack/react-query';
import { useEffect, type ReactNode } from 'react';
import { AppErrorBoundary } from '@/components/errors/app-error-boundary';
import { meQueryKey } from '@/features/auth/api/get-me';
import { onUnauthorized } from '@/lib/api-client';
import { queryClient } from '@/lib/query-client';
import { theme } from '@/theme/theme';

export function AppProvider({ children }: { children: ReactNode }) {
  // A request that finds the session gone marks the user signed out; the route guards then
  // send them to sign in and back.
  useEffect(() => onUnauthorized(() => queryClient.setQueryData(meQueryKey, null)), []);

  return (
    <ThemeProvider theme={theme}>
      <CssBaseline />
      <AppErrorBoundary>
        <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>
      </AppErrorBoundary>
    </ThemeProvider>
  );
}
