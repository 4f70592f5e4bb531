// Two unit choices in quick succession: the answer to the first arriving after the second must
// not undo the second choice.
import type { Me } from '@heatpath/contracts';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { act, renderHook, waitFor } from '@testing-library/react';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { json, makeMe, mockApi } from '../test/api-mock';
import { meQueryKey } from './auth';
import { useUpdateUnitPreferences } from './unit-preferences';

afterEach(() => {
  vi.unstubAllGlobals();
});

describe('saving unit choices', () => {
  it('keeps the last choice when an earlier answer arrives late', async () => {
    const start = makeMe({ role: 'technician' });
    let server: Me = start;
    const pending: (() => void)[] = [];
    mockApi({
      'GET /api/me': () => json(server),
      'PATCH /api/me/preferences': (request) => {
        const body = request.body as { units: Partial<Me['preferences']['units']> };
        server = {
          ...server,
          preferences: { units: { ...server.preferences.units, ...body.units } },
        };
        const answer = server;
        // Each answer waits until the test lets it go, so they can be released out of order.
        return new Promise((resolve) => pending.push(() => resolve(json(answer))));
      },
    });
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    client.setQueryData(meQueryKey, start);
    const wrapper = ({ children }: { children: ReactNode }) => (
      <QueryClientProvider client={client}>{children}</QueryClientProvider>
    );
    const { result } = renderHook(() => useUpdateUnitPreferences(), { wrapper });
    const temperature = () => client.getQueryData<Me>(meQueryKey)?.preferences.units.temperature;
    const seen: (string | undefined)[] = [];
    client.getQueryCache().subscribe(() => seen.push(temperature()));

    act(() => result.current.mutate({ units: { temperature: 'F' } }));
    await waitFor(() => expect(pending).toHaveLength(1));
    act(() => result.current.mutate({ units: { temperature: 'C' } }));
    await waitFor(() => expect(pending).toHaveLength(2));
    expect(temperature()).toBe('C');

    // The second answer first, then the first one, late (it says °F).
    await act(async () => pending[1]!());
    await act(async () => pending[0]!());
    await waitFor(() => expect(client.isMutating() + client.isFetching()).toBe(0));
    expect(temperature()).toBe('C');
    // It never flipped back to °F on the way.
    expect(seen.slice(seen.indexOf('C'))).not.toContain('F');
  });
});
