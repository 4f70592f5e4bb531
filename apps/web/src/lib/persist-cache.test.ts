import 'fake-indexeddb/auto';
import {
  persistQueryClientRestore,
  persistQueryClientSave,
} from '@tanstack/react-query-persist-client';
import { openDB } from 'idb';
import { afterEach, describe, expect, it } from 'vitest';
import { makeMe } from '../test/api-mock';
import { caseId, makeCaseDetail, paths } from '../test/case-fixtures';
import { meQueryKey } from './auth';
import {
  cacheBuster,
  cacheDatabaseName,
  cachePersistOptions,
  cachePersister,
  clearCachedData,
  isPersistedQueryKey,
  keepCacheToOnePerson,
  saveCacheNow,
} from './persist-cache';
import { createQueryClient } from './query-client';
import { casesKeys, staffKeys, treesKeys } from './query-keys';

const mineFilters = { scope: 'mine' } as const;
const list = { pages: [{ cases: [], nextCursor: null }], pageParams: [null] };

/** What the tablet holds now, read straight from IndexedDB. */
async function storedKeys(): Promise<unknown[][] | undefined> {
  const db = await openDB(cacheDatabaseName, 1);
  const raw: unknown = await db.get('query-cache', 'query-client');
  db.close();
  if (typeof raw !== 'string') return undefined;
  const client = JSON.parse(raw) as { clientState: { queries: { queryKey: unknown[] }[] } };
  return client.clientState.queries.map((query) => query.queryKey);
}

function filledClient() {
  const queryClient = createQueryClient();
  queryClient.setQueryData(meQueryKey, makeMe({ role: 'technician' }));
  queryClient.setQueryData(casesKeys.list(mineFilters), list);
  queryClient.setQueryData(casesKeys.detail(caseId), makeCaseDetail(paths.blockTest));
  queryClient.setQueryData(casesKeys.events(caseId), { events: [] });
  queryClient.setQueryData(staffKeys.list(), { staff: [] });
  queryClient.setQueryData(treesKeys.available(), { trees: [] });
  return queryClient;
}

afterEach(async () => {
  await cachePersister.removeClient();
});

describe('the cache kept on the tablet', () => {
  it('keeps the signed-in person, the case lists and the cases, nothing else', async () => {
    await persistQueryClientSave({ queryClient: filledClient(), ...cachePersistOptions });
    const keys = await storedKeys();
    expect(keys).toHaveLength(3);
    expect(keys).toEqual(
      expect.arrayContaining([
        [...meQueryKey],
        [...casesKeys.list(mineFilters)],
        [...casesKeys.detail(caseId)],
      ]),
    );
    expect(isPersistedQueryKey(casesKeys.events(caseId))).toBe(false);
    expect(isPersistedQueryKey(staffKeys.list())).toBe(false);
  });

  it('keeps neither failed queries nor mutations', async () => {
    const queryClient = filledClient();
    await queryClient
      .fetchQuery({
        queryKey: casesKeys.detail('other'),
        queryFn: () => Promise.reject(new Error('x')),
        retry: false,
      })
      .catch(() => undefined);
    queryClient.getMutationCache().build(queryClient, { mutationKey: ['walk'] });
    await persistQueryClientSave({ queryClient, ...cachePersistOptions });
    expect(await storedKeys()).not.toContainEqual([...casesKeys.detail('other')]);
    const db = await openDB(cacheDatabaseName, 1);
    const raw = (await db.get('query-cache', 'query-client')) as string;
    db.close();
    expect(
      (JSON.parse(raw) as { clientState: { mutations: unknown[] } }).clientState.mutations,
    ).toEqual([]);
  });

  it('gives a reloaded page the person and the case, with their data as stored', async () => {
    await persistQueryClientSave({ queryClient: filledClient(), ...cachePersistOptions });
    const reloaded = createQueryClient();
    await persistQueryClientRestore({ queryClient: reloaded, ...cachePersistOptions });
    expect(reloaded.getQueryData(meQueryKey)).toEqual(makeMe({ role: 'technician' }));
    expect(reloaded.getQueryData(casesKeys.detail(caseId))).toEqual(
      makeCaseDetail(paths.blockTest),
    );
    expect(reloaded.getQueryData(staffKeys.list())).toBeUndefined();
  });

  it('writes a unit chosen a moment ago at once, so a reload straight after still has it', async () => {
    const queryClient = filledClient();
    const me = makeMe({ role: 'technician' });
    const psi = { ...me.preferences.units, pressure: 'psi' as const };
    queryClient.setQueryData(meQueryKey, { ...me, preferences: { ...me.preferences, units: psi } });
    // No throttled save is waited for: this write alone is what the reload finds.
    await saveCacheNow(queryClient);
    const reloaded = createQueryClient();
    await persistQueryClientRestore({ queryClient: reloaded, ...cachePersistOptions });
    expect(reloaded.getQueryData<typeof me>(meQueryKey)?.preferences.units.pressure).toBe('psi');
  });

  it('does not read what another build stored', async () => {
    await persistQueryClientSave({
      queryClient: filledClient(),
      ...cachePersistOptions,
      buster: `${cacheBuster}-before`,
    });
    const reloaded = createQueryClient();
    await persistQueryClientRestore({ queryClient: reloaded, ...cachePersistOptions });
    expect(reloaded.getQueryData(meQueryKey)).toBeUndefined();
    expect(await storedKeys()).toBeUndefined();
  });

  it('forgets everything, in memory and on the tablet, when cleared', async () => {
    const queryClient = filledClient();
    await persistQueryClientSave({ queryClient, ...cachePersistOptions });
    expect(await storedKeys()).toHaveLength(3);
    await clearCachedData(queryClient);
    expect(queryClient.getQueryData(meQueryKey)).toBeUndefined();
    expect(await storedKeys()).toBeUndefined();
  });

  it('drops the last person’s cases when someone else signs in on the tablet', async () => {
    await persistQueryClientSave({ queryClient: filledClient(), ...cachePersistOptions });
    const reloaded = createQueryClient();
    keepCacheToOnePerson(reloaded);
    await persistQueryClientRestore({ queryClient: reloaded, ...cachePersistOptions });
    // The same person again (a fresh "me"): the cases stay.
    reloaded.setQueryData(meQueryKey, makeMe({ role: 'technician', name: 'Renamed' }));
    expect(reloaded.getQueryData(casesKeys.detail(caseId))).toBeDefined();
    const other = makeMe({ id: '00000000-0000-4000-8000-000000000009', role: 'technician' });
    reloaded.setQueryData(meQueryKey, other);
    await Promise.resolve();
    expect(reloaded.getQueryData(casesKeys.detail(caseId))).toBeUndefined();
    expect(reloaded.getQueryData(casesKeys.list(mineFilters))).toBeUndefined();
    expect(reloaded.getQueryData(meQueryKey)).toEqual(other);
  });
});
