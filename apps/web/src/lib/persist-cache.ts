// Keeps part of the query cache on the tablet (IndexedDB, database `heatpath-cache`), so the app
// opens after a reload with no network: the signed-in person, the case lists, and the cases
// themselves, which carry their pinned tree. Nothing else: other screens need the network anyway,
// and the answers given offline live in the outbox, which is not this cache. The stored copy is
// dropped after a week, by another build, at sign-out and when the session has expired.
import { createAsyncStoragePersister } from '@tanstack/query-async-storage-persister';
import type { Me } from '@heatpath/contracts';
import {
  defaultShouldDehydrateQuery,
  dehydrate,
  hashKey,
  type Query,
  type QueryClient,
  type QueryKey,
} from '@tanstack/react-query';
import type { PersistQueryClientOptions } from '@tanstack/react-query-persist-client';
import { openDB, type IDBPDatabase } from 'idb';
import { meQueryKey } from './auth';
import { casesKeys } from './query-keys';

export const cacheDatabaseName = 'heatpath-cache';
const storeName = 'query-cache';
const cacheKey = 'query-client';

/** How long a stored cache is good for: a technician's week of open cases. */
export const cacheMaxAge = 7 * 24 * 60 * 60_000;

/** The build that wrote the cache (vite.config.ts); another build's cache is not read. */
export const cacheBuster: string = String(import.meta.env.HEATPATH_BUILD_ID ?? 'dev');

let database: Promise<IDBPDatabase> | undefined;

function openCacheDatabase(): Promise<IDBPDatabase> {
  database ??= openDB(cacheDatabaseName, 1, {
    upgrade(db) {
      db.createObjectStore(storeName);
    },
  });
  // A browser that refuses IndexedDB (a private window) may be asked again later.
  database.catch(() => {
    database = undefined;
  });
  return database;
}

const storage = {
  getItem: async (key: string): Promise<string | undefined> => {
    const value: unknown = await (await openCacheDatabase()).get(storeName, key);
    return typeof value === 'string' ? value : undefined;
  },
  setItem: async (key: string, value: string): Promise<void> => {
    await (await openCacheDatabase()).put(storeName, value, key);
  },
  removeItem: async (key: string): Promise<void> => {
    await (await openCacheDatabase()).delete(storeName, key);
  },
};

/** Resolves when the browser has a moment to spare, within two seconds at most. */
function whenIdle(): Promise<void> {
  return new Promise((resolve) => {
    if (typeof requestIdleCallback === 'function') {
      requestIdleCallback(() => resolve(), { timeout: 2000 });
    } else {
      setTimeout(resolve, 0);
    }
  });
}

/** When the stored cache was last removed: a save taken before then must not bring it back. */
let removedAt = 0;

class SaveFromBeforeRemoval extends Error {}

const persister = createAsyncStoragePersister({
  storage,
  key: cacheKey,
  // At most one save a second, written when the browser is idle: a tap at the car is painted
  // first, the cases (with their trees) are serialised after.
  throttleTime: 1000,
  serialize: async (client) => {
    await whenIdle();
    // A save waiting out the throttle carries the cache as it was when it was asked for; after a
    // sign-out (or another person) it would write the last person's cases back onto the tablet.
    if (client.timestamp <= removedAt) throw new SaveFromBeforeRemoval();
    return JSON.stringify(client);
  },
});

export const cachePersister: typeof persister = {
  ...persister,
  removeClient: async () => {
    removedAt = Date.now();
    await persister.removeClient();
  },
};

/** The queries kept on the tablet: "me", every case list, and each case (not its audit trail). */
export function isPersistedQueryKey(queryKey: QueryKey): boolean {
  const [root, kind] = queryKey;
  if (root === meQueryKey[0]) return queryKey.length === meQueryKey.length;
  if (root !== casesKeys.all[0]) return false;
  if (kind === casesKeys.lists()[1]) return true;
  return kind === casesKeys.details()[1] && queryKey.length === casesKeys.detail('').length;
}

function shouldPersistQuery(query: Query): boolean {
  return defaultShouldDehydrateQuery(query) && isPersistedQueryKey(query.queryKey);
}

export const cachePersistOptions: Omit<PersistQueryClientOptions, 'queryClient'> = {
  persister: cachePersister,
  maxAge: cacheMaxAge,
  buster: cacheBuster,
  dehydrateOptions: {
    shouldDehydrateQuery: shouldPersistQuery,
    // Mutations are never replayed from here: answers given offline go through the outbox.
    shouldDehydrateMutation: () => false,
  },
};

/**
 * Writes the kept cache at once, without waiting for the throttled save: for a rare change the
 * tablet must not lose to a reload a moment later (a unit chosen while offline, which is the
 * person's preference until the server has it). A refused write changes nothing else.
 */
export async function saveCacheNow(queryClient: QueryClient): Promise<void> {
  const client = {
    buster: cacheBuster,
    timestamp: Date.now(),
    clientState: dehydrate(queryClient, cachePersistOptions.dehydrateOptions),
  };
  await storage.setItem(cacheKey, JSON.stringify(client)).catch(() => undefined);
}

/**
 * Keeps the persisted queries in memory as long as they are kept on disk: an unused query is
 * otherwise dropped after five minutes, and the next save would drop it from the tablet too.
 */
export function keepPersistedQueries(queryClient: QueryClient): void {
  for (const queryKey of [meQueryKey, casesKeys.lists(), casesKeys.details()]) {
    queryClient.setQueryDefaults(queryKey, { gcTime: cacheMaxAge });
  }
}

/**
 * The cache belongs to one person: when someone else signs in on the tablet (the last person's
 * data restored without a sign-out in between), everything but the new "me" is dropped before a
 * screen can show it, and so never saved again. Returns the unsubscribe.
 */
export function keepCacheToOnePerson(queryClient: QueryClient): () => void {
  const meHash = hashKey(meQueryKey);
  let personId: string | undefined;
  return queryClient.getQueryCache().subscribe((event) => {
    if (event.type !== 'added' && event.type !== 'updated') return;
    if (event.query.queryHash !== meHash) return;
    const id = (event.query.state.data as Me | undefined)?.id;
    if (!id) return;
    if (personId !== undefined && personId !== id) {
      queryClient.removeQueries({ predicate: (query) => query.queryHash !== meHash });
    }
    personId = id;
  });
}

/** Forgets everything cached, in memory and on the tablet (sign-out, an expired session). */
export async function clearCachedData(queryClient: QueryClient): Promise<void> {
  queryClient.clear();
  try {
    await cachePersister.removeClient();
  } catch {
    // No IndexedDB in this browser: nothing was stored.
  }
}
