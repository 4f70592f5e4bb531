import { meSchema } from '@heatpath/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { errorResponse, json, makeMe, mockApi } from '../test/api-mock';
import { ApiError, apiRequest, apiRequestForm, apiRequestNoContent } from './api-client';

afterEach(() => vi.unstubAllGlobals());

async function caught(promise: Promise<unknown>): Promise<ApiError> {
  try {
    await promise;
  } catch (error) {
    if (error instanceof ApiError) return error;
    throw error;
  }
  throw new Error('expected the request to fail');
}

describe('apiRequest', () => {
  it('returns the parsed body and sends a GET without the client header', async () => {
    const { requests } = mockApi({ 'GET /api/me': () => json(makeMe()) });
    const me = await apiRequest('/api/me', meSchema);
    expect(me.name).toBe('Rosa Quell');
    expect(requests[0]?.credentials).toBe('same-origin');
    expect(requests[0]?.headers['x-heatpath-client']).toBeUndefined();
  });

  it('marks every non-GET request as coming from the web client, with a JSON body type', async () => {
    const { requests } = mockApi({ 'PATCH /api/me/preferences': () => json(makeMe()) });
    await apiRequest('/api/me/preferences', meSchema, {
      method: 'PATCH',
      body: { units: { temperature: 'F' } },
    });
    expect(requests[0]?.headers['x-heatpath-client']).toBe('web');
    expect(requests[0]?.headers['content-type']).toBe('application/json');
    expect(requests[0]?.body).toEqual({ units: { temperature: 'F' } });
  });

  it('sends the client header but no content type on a bodiless POST', async () => {
    const { requests } = mockApi({
      'POST /api/auth/sign-out': () => new Response(null, { status: 204 }),
    });
    await apiRequestNoContent('/api/auth/sign-out', { method: 'POST' });
    expect(requests[0]?.headers['x-heatpath-client']).toBe('web');
    expect(requests[0]?.headers['content-type']).toBeUndefined();
  });

  it('sends an upload as multipart form data, leaving its content type to the browser', async () => {
    const { fetchMock } = mockApi({ 'POST /api/me': () => json(makeMe(), 201) });
    const form = new FormData();
    form.append('file', new File(['x'], 'leak.jpg', { type: 'image/jpeg' }));
    await apiRequestForm('/api/me', meSchema, form);
    const init = fetchMock.mock.calls[0]?.[1];
    const headers = new Headers(init?.headers);
    expect(init?.method).toBe('POST');
    expect(init?.body).toBe(form);
    expect(headers.get('x-heatpath-client')).toBe('web');
    expect(headers.get('content-type')).toBeNull();
  });

  it('turns the API error body into an ApiError with its code, message and fields', async () => {
    mockApi({
      'POST /api/staff': () =>
        errorResponse(400, 'validation_failed', 'Check the highlighted fields.', {
          email: 'Enter a valid e-mail address.',
        }),
    });
    const error = await caught(apiRequest('/api/staff', meSchema, { method: 'POST', body: {} }));
    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('Check the highlighted fields.');
    expect(error.fields).toEqual({ email: 'Enter a valid e-mail address.' });
  });

  it('gives a sentence, not a status number, when the error body is not the API’s', async () => {
    mockApi({ 'GET /api/me': () => new Response('<html>Bad gateway</html>', { status: 502 }) });
    const error = await caught(apiRequest('/api/me', meSchema));
    expect(error.code).toBe('internal');
    expect(error.message).toMatch(/went wrong on the server/);
    expect(error.message).not.toMatch(/502/);
  });

  it('reports a dropped connection as a network problem', async () => {
    vi.stubGlobal(
      'fetch',
      vi.fn(() => Promise.reject(new TypeError('Failed to fetch'))),
    );
    const error = await caught(apiRequest('/api/me', meSchema));
    expect(error.code).toBe('network');
    expect(error.message).toMatch(/cannot reach the server/);
  });

  it('refuses an answer that does not match the contract', async () => {
    mockApi({ 'GET /api/me': () => json({ name: 'no id' }) });
    const error = await caught(apiRequest('/api/me', meSchema));
    expect(error.code).toBe('bad_response');
  });
});
