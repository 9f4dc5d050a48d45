import { QueryClient, type DefaultOptions } from '@tanstack/react-query';
import { isApiError } from './api-client';

const MAX_RETRIES = 2;

export const queryConfig = {
  queries: {
    staleTime: 30_000,
    refetchOnWindowFocus: false,
    // A 4xx will answer the same way again; only network trouble and 5xx are worth retrying.
    retry: (failureCount, error) =>
      failureCount < MAX_RETRIES &&
      !(isApiError(error) && error.statusCode >= 400 && error.statusCode < 500),
  },
  mutations: { retry: false },
} satisfies DefaultOptions;

export const queryClient = new QueryClient({ defaultOptions: queryConfig });
