import { onlineManager } from '@tanstack/react-query';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { meQueryKey } from '../lib/auth';
import { createQueryClient } from '../lib/query-client';
import { makeMe } from '../test/api-mock';
import { requireMe, safeNextPath, signInPath } from './guards';

describe('sign-in redirects', () => {
  it('remembers the wanted screen', () => {
    expect(signInPath('/staff')).toBe('/sign-in?next=%2Fstaff');
    expect(signInPath('/')).toBe('/sign-in');
  });

  it('only follows paths inside the app after signing in', () => {
    expect(safeNextPath('/staff')).toBe('/staff');
    expect(safeNextPath('//evil.test/x')).toBe('/');
    expect(safeNextPath('https://evil.test')).toBe('/');
    expect(safeNextPath('/sign-in')).toBe('/');
    expect(safeNextPath(null)).toBe('/');
  });
});

describe('the signed-in person with no network', () => {
  const request = new Request('http://heatpath.test/cases/c1');

  afterEach(() => {
    onlineManager.setOnline(true);
    vi.unstubAllGlobals();
  });

  it('is the one restored from the cache, without asking the server', async () => {
    const fetchMock = vi.fn();
    vi.stubGlobal('fetch', fetchMock);
    onlineManager.setOnline(false);
    const queryClient = createQueryClient();
    queryClient.setQueryData(meQueryKey, makeMe({ role: 'technician' }));
    await expect(requireMe(queryClient, request)).resolves.toEqual(makeMe({ role: 'technician' }));
    expect(fetchMock).not.toHaveBeenCalled();
  });

  it('with nobody in the cache, is asked for at sign-in instead of waiting for the network', async () => {
    onlineManager.setOnline(false);
    const thrown: unknown = await requireMe(createQueryClient(), request).catch(
      (error: unknown) => error,
    );
    expect(thrown).toBeInstanceOf(Response);
    expect((thrown as Response).headers.get('Location')).toBe('/sign-in?next=%2Fcases%2Fc1');
  });
});
