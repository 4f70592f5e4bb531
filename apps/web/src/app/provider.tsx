// Wires the query client to the router: the query client notices an expired session anywhere,
// the router takes the person to sign-in. The cache kept on the tablet (lib/persist-cache.ts) is
// restored before the router starts, so the first screen's loaders already find the signed-in
// person and the cases, with or without a network. All of it is made once per page load.
import { useIsRestoring } from '@tanstack/react-query';
import { PersistQueryClientProvider } from '@tanstack/react-query-persist-client';
import { useState } from 'react';
import { RouterProvider } from 'react-router';
import { startOnlineFromBrowser } from '../lib/online';
import {
  cachePersistOptions,
  clearCachedData,
  keepCacheToOnePerson,
  keepPersistedQueries,
} from '../lib/persist-cache';
import { createQueryClient } from '../lib/query-client';
import { signInPath } from './guards';
import { createAppRouter } from './router';
import { StartingUp } from './shell/error-pages';

type AppRouter = ReturnType<typeof createAppRouter>;

function createApp() {
  startOnlineFromBrowser();
  let router: AppRouter | undefined;
  const queryClient = createQueryClient({
    onUnauthenticated: () => {
      if (!router) return;
      const { initialized, navigation, location } = router.state;
      // While a navigation is loading, its loader meets the same 401 and redirects by itself.
      if (!initialized || navigation.state !== 'idle') return;
      if (location.pathname === '/sign-in') return;
      void router
        .navigate(signInPath(location.pathname + location.search), { replace: true })
        // Clear only once the signed-in screens are gone, so none of them renders without "me".
        .then(() => clearCachedData(queryClient));
    },
  });
  keepPersistedQueries(queryClient);
  keepCacheToOnePerson(queryClient);
  // Called once the cache is restored: creating the router starts the first screen's loaders.
  const startRouter = () => (router = createAppRouter(queryClient));
  return { queryClient, startRouter };
}

function RestoredRouter({ startRouter }: { startRouter: () => AppRouter }) {
  const [router] = useState(startRouter);
  return <RouterProvider router={router} />;
}

function AppRouterOnceRestored({ startRouter }: { startRouter: () => AppRouter }) {
  return useIsRestoring() ? <StartingUp /> : <RestoredRouter startRouter={startRouter} />;
}

export function AppProvider() {
  const [{ queryClient, startRouter }] = useState(createApp);
  return (
    <PersistQueryClientProvider
      client={queryClient}
      persistOptions={cachePersistOptions}
      // What was kept may be older than the server's (a unit changed a moment before the reload,
      // an answer from another tablet): shown at once, it is read again as soon as a screen uses
      // it and the network allows.
      onSuccess={() => queryClient.invalidateQueries()}
    >
      <AppRouterOnceRestored startRouter={startRouter} />
    </PersistQueryClientProvider>
  );
}
