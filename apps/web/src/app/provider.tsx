// Wires the query client to the router: the query client notices an expired session anywhere,
// the router takes the person to sign-in. Both are made once per page load.
import { QueryClientProvider } from '@tanstack/react-query';
import { useState } from 'react';
import { RouterProvider } from 'react-router';
import { createQueryClient } from '../lib/query-client';
import { signInPath } from './guards';
import { createAppRouter } from './router';

function createApp() {
  const queryClient = createQueryClient({
    onUnauthenticated: () => {
      const { initialized, navigation, location } = router.state;
      // While a navigation is loading, its loader meets the same 401 and redirects by itself.
      if (!initialized || navigation.state !== 'idle') return;
      if (location.pathname === '/sign-in') return;
      void router
        .navigate(signInPath(location.pathname + location.search), { replace: true })
        // Clear only once the signed-in screens are gone, so none of them renders without "me".
        .then(() => queryClient.clear());
    },
  });
  // Declared after the query client it needs; the callback above only runs once both exist.
  const router = createAppRouter(queryClient);
  return { queryClient, router };
}

export function AppProvider() {
  const [{ queryClient, router }] = useState(createApp);
  return (
    <QueryClientProvider client={queryClient}>
      <RouterProvider router={router} />
    </QueryClientProvider>
  );
}
