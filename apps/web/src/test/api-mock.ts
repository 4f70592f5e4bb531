// A stand-in for the API in component tests: answers fetch calls by method and path, and records
// them so a test can check what the web app sent.
import type { Me, StaffMember } from '@heatpath/contracts';
import { vi } from 'vitest';

export interface RecordedRequest {
  method: string;
  path: string;
  headers: Record<string, string>;
  body: unknown;
  credentials: RequestCredentials | undefined;
}

type Handler = (request: RecordedRequest) => Response | Promise<Response>;

export function json(body: unknown, status = 200): Response {
  return new Response(JSON.stringify(body), {
    status,
    headers: { 'Content-Type': 'application/json' },
  });
}

export function errorResponse(
  status: number,
  code: string,
  message: string,
  fields?: Record<string, string>,
): Response {
  return json({ error: { code, message, ...(fields ? { fields } : {}) } }, status);
}

export function mockApi(handlers: Record<string, Handler>) {
  const requests: RecordedRequest[] = [];
  const fetchMock = vi.fn(async (input: RequestInfo | URL, init: RequestInit = {}) => {
    const url = new URL(String(input), 'http://heatpath.test');
    const method = (init.method ?? 'GET').toUpperCase();
    const headers = Object.fromEntries(new Headers(init.headers).entries());
    const body: unknown = typeof init.body === 'string' ? JSON.parse(init.body) : undefined;
    const request: RecordedRequest = {
      method,
      path: url.pathname,
      headers,
      body,
      credentials: init.credentials,
    };
    requests.push(request);
    const handler =
      handlers[`${method} ${url.pathname}`] ??
      Object.entries(handlers).find(([key]) => {
        const [m, pattern] = key.split(' ');
        return (
          m === method && pattern?.endsWith('*') && url.pathname.startsWith(pattern.slice(0, -1))
        );
      })?.[1];
    if (!handler)
      return errorResponse(404, 'not_found', `No test handler for ${method} ${url.pathname}`);
    return handler(request);
  });
  vi.stubGlobal('fetch', fetchMock);
  return { requests, fetchMock };
}

export function makeMe(overrides: Partial<Me> = {}): Me {
  return {
    id: '00000000-0000-4000-8000-000000000001',
    email: 'lead@harbourlane.test',
    name: 'Rosa Quell',
    role: 'lead',
    workshop: { id: '00000000-0000-4000-8000-0000000000aa', name: 'Harbour Lane Garage' },
    preferences: { units: { temperature: 'C', pressure: 'bar', volume: 'L' } },
    ...overrides,
  };
}

export function makeStaffMember(overrides: Partial<StaffMember> = {}): StaffMember {
  return {
    id: '00000000-0000-4000-8000-000000000002',
    email: 'tech@harbourlane.test',
    name: 'Tomas Brand',
    role: 'technician',
    active: true,
    invitationPending: false,
    createdAt: '2025-01-01T08:00:00.000Z',
    ...overrides,
  };
}
