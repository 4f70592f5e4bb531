// The app as a reloaded page starts it (AppProvider: the cache restored from IndexedDB, then the
// router), with and without a network.
import 'fake-indexeddb/auto';
import { dehydrate, onlineManager } from '@tanstack/react-query';
import { act, cleanup, render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { openDB } from 'idb';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { meQueryKey } from '../lib/auth';
import {
  cacheBuster,
  cacheDatabaseName,
  cachePersistOptions,
  cachePersister,
} from '../lib/persist-cache';
import { createQueryClient } from '../lib/query-client';
import { casesKeys } from '../lib/query-keys';
import { errorResponse, json, makeMe, mockApi } from '../test/api-mock';
import { caseId, makeCaseDetail, paths } from '../test/case-fixtures';
import { AppProvider } from './provider';

const technician = makeMe({ role: 'technician' });
const offlineLine = /answers are kept on this tablet and sent when the network returns/;

/**
 * A page that was open before the reload left these in the tablet's cache. Written straight into
 * IndexedDB: the app's own saves are throttled, so one made through them could land after the
 * page under test has already read the cache.
 */
async function cacheOnTablet() {
  const queryClient = createQueryClient();
  queryClient.setQueryData(meQueryKey, technician);
  queryClient.setQueryData(casesKeys.detail(caseId), makeCaseDetail(paths.blockTest));
  const stored = {
    timestamp: Date.now(),
    buster: cacheBuster,
    clientState: dehydrate(queryClient, cachePersistOptions.dehydrateOptions),
  };
  const db = await openDB(cacheDatabaseName, 1, {
    upgrade: (created) => created.createObjectStore('query-cache'),
  });
  await db.put('query-cache', JSON.stringify(stored), 'query-client');
  db.close();
}

async function storedQueryCount(): Promise<number> {
  const db = await openDB(cacheDatabaseName, 1);
  const raw: unknown = await db.get('query-cache', 'query-client');
  db.close();
  if (typeof raw !== 'string') return 0;
  return (JSON.parse(raw) as { clientState: { queries: unknown[] } }).clientState.queries.length;
}

function openAt(path: string, { online }: { online: boolean }) {
  vi.spyOn(navigator, 'onLine', 'get').mockReturnValue(online);
  window.history.replaceState(null, '', path);
  return render(<AppProvider />);
}

afterEach(async () => {
  cleanup();
  vi.unstubAllGlobals();
  vi.restoreAllMocks();
  onlineManager.setOnline(true);
  await cachePersister.removeClient();
});

describe('a reload with no network', () => {
  it('opens the case from the cache kept on the tablet and says the tablet is offline', async () => {
    await cacheOnTablet();
    const api = mockApi({});
    api.fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    openAt(`/cases/${caseId}`, { online: false });
    expect(
      await screen.findByRole('heading', { level: 2, name: 'Block test for combustion gas' }),
    ).toBeTruthy();
    expect(screen.getByText(offlineLine)).toBeTruthy();
    // Nothing was asked of the network: the guard and the page went by the restored cache.
    expect(api.requests).toEqual([]);
  });

  it('sends a tablet with nobody in its cache to sign-in, which says it needs the network', async () => {
    const api = mockApi({});
    api.fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    openAt(`/cases/${caseId}`, { online: false });
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    expect(screen.getByText(/Signing in needs the network/)).toBeTruthy();
  });

  it('takes the line away when the network returns', async () => {
    await cacheOnTablet();
    mockApi({
      'GET /api/me': () => json(technician),
      [`GET /api/cases/${caseId}`]: () => json(makeCaseDetail(paths.blockTest)),
      [`GET /api/cases/${caseId}/events`]: () => json({ events: [] }),
    });
    openAt(`/cases/${caseId}`, { online: false });
    expect(await screen.findByText(offlineLine)).toBeTruthy();
    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(screen.queryByText(offlineLine)).toBeNull());
  });
});

describe('the cache kept on the tablet', () => {
  it('is read again when the network is there, so a change made just before a reload stays', async () => {
    await cacheOnTablet();
    // The server already has what the stored copy missed (saved a moment before the reload).
    mockApi({ 'GET /api/me': () => json({ ...technician, name: 'Ines Varga-Holm' }) });
    openAt('/', { online: true });
    expect(await screen.findByText('Ines Varga-Holm')).toBeTruthy();
  });

  it('keeps the person signed in while offline and says signing out needs the network', async () => {
    await cacheOnTablet();
    const api = mockApi({});
    api.fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    openAt('/', { online: false });
    const signOut = await screen.findByRole('button', { name: 'Sign out' });
    expect(signOut).toHaveProperty('disabled', true);
    expect(screen.getByText(/Signing out needs the network/)).toBeTruthy();
    act(() => onlineManager.setOnline(true));
    await waitFor(() => expect(signOut).toHaveProperty('disabled', false));
  });

  it('is emptied at sign-out', async () => {
    await cacheOnTablet();
    let signedIn = true;
    mockApi({
      'GET /api/me': () =>
        signedIn ? json(technician) : errorResponse(401, 'unauthenticated', 'Sign in first.'),
      'POST /api/auth/sign-out': () => {
        signedIn = false;
        return new Response(null, { status: 204 });
      },
    });
    openAt('/', { online: true });
    await userEvent.click(await screen.findByRole('button', { name: 'Sign out' }));
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    await waitFor(async () => expect(await storedQueryCount()).toBe(0));
  });

  it('is emptied when the server says the session has ended', async () => {
    await cacheOnTablet();
    mockApi({
      'GET /api/me': () => errorResponse(401, 'unauthenticated', 'Sign in again.'),
    });
    openAt('/sign-in', { online: true });
    expect(await screen.findByRole('heading', { level: 1, name: 'Sign in' })).toBeTruthy();
    await waitFor(async () => expect(await storedQueryCount()).toBe(0));
  });
});
