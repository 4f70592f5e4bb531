import { describe, expect, it, vi } from 'vitest';
import { ApiError } from './api-client';
import { createQueryClient } from './query-client';

const expired = () =>
  new ApiError({ status: 401, code: 'unauthenticated', message: 'Sign in again.' });

describe('the query client', () => {
  it('reports an expired session from any query', async () => {
    const onUnauthenticated = vi.fn();
    const client = createQueryClient({ onUnauthenticated });
    await client
      .fetchQuery({ queryKey: ['staff'], queryFn: () => Promise.reject(expired()) })
      .catch(() => undefined);
    expect(onUnauthenticated).toHaveBeenCalledOnce();
  });

  it('leaves a 401 alone where it is an ordinary answer, such as a wrong password', async () => {
    const onUnauthenticated = vi.fn();
    const client = createQueryClient({ onUnauthenticated });
    const mutation = client.getMutationCache().build(client, {
      mutationFn: () => Promise.reject(expired()),
      meta: { expectsUnauthenticated: true },
    });
    await mutation.execute(undefined).catch(() => undefined);
    expect(onUnauthenticated).not.toHaveBeenCalled();
  });

  it('does not retry a refusal, but does retry a server failure', async () => {
    const client = createQueryClient();
    const refused = vi.fn(() =>
      Promise.reject(new ApiError({ status: 403, code: 'forbidden', message: 'No.' })),
    );
    await client.fetchQuery({ queryKey: ['a'], queryFn: refused }).catch(() => 0);
    expect(refused).toHaveBeenCalledOnce();

    const failing = vi.fn(() =>
      Promise.reject(new ApiError({ status: 500, code: 'internal', message: 'Oops.' })),
    );
    await client
      .fetchQuery({ queryKey: ['b'], queryFn: failing, retryDelay: 0 })
      .catch(() => undefined);
    expect(failing).toHaveBeenCalledTimes(3);
  });
});
