// Renders the real route tree in memory, so tests walk the same loaders, guards and screens as
// the browser does.
import { QueryClientProvider } from '@tanstack/react-query';
import { render } from '@testing-library/react';
import { createMemoryRouter, RouterProvider } from 'react-router';
import { createRoutes } from '../app/router';
import { createQueryClient } from '../lib/query-client';

export function renderApp(path: string) {
  const queryClient = createQueryClient();
  // The app's retries stay (a 5xx is still asked again), but without the seconds between them.
  queryClient.setDefaultOptions({
    ...queryClient.getDefaultOptions(),
    queries: { ...queryClient.getDefaultOptions().queries, retryDelay: 0 },
  });
  const router = createMemoryRouter(createRoutes(queryClient), { initialEntries: [path] });
  const view = render(
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>,
  );
  return { ...view, router, queryClient };
}
