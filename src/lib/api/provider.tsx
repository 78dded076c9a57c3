import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ComponentType, ReactNode } from 'react';

/**
 * One QueryClient for the whole page: every island is its own React root, and each root is wrapped in
 * ApiProvider with this same instance, so islands on one page share one cache.
 */
export const queryClient = new QueryClient({
  defaultOptions: {
    queries: { retry: 1, refetchOnWindowFocus: false, staleTime: 30_000 },
    mutations: { retry: false },
  },
});

export function ApiProvider({ children }: { children: ReactNode }) {
  return <QueryClientProvider client={queryClient}>{children}</QueryClientProvider>;
}

/** Wraps an island's root component in the page's ApiProvider. */
export function withApi<P extends object>(Island: ComponentType<P>): ComponentType<P> {
  function WithApi(props: P) {
    return (
      <ApiProvider>
        <Island {...props} />
      </ApiProvider>
    );
  }
  WithApi.displayName = `withApi(${Island.displayName ?? Island.name ?? 'Island'})`;
  return WithApi;
}
