// A tiny client for the API with one demo person's session cookie, as the web app sends it:
// browser tests use it to set up records they then look at in the browser.
import { baseUrl, demoPassword } from './browser';

export async function apiAs(email: string) {
  const signIn = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Heatpath-Client': 'web' },
    body: JSON.stringify({ email, password: demoPassword }),
  });
  if (!signIn.ok) throw new Error(`sign-in for ${email}: ${signIn.status}`);
  const cookie = (signIn.headers.get('set-cookie') ?? '').split(';')[0] ?? '';
  return async <T = Record<string, unknown>>(
    method: string,
    path: string,
    body?: unknown,
  ): Promise<T> => {
    const res = await fetch(`${baseUrl}${path}`, {
      method,
      headers: {
        Cookie: cookie,
        'X-Heatpath-Client': 'web',
        ...(body instanceof FormData || body === undefined
          ? {}
          : { 'Content-Type': 'application/json' }),
      },
      body: body instanceof FormData ? body : body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${text}`);
    return JSON.parse(text) as T;
  };
}

/** Uploads one file to a case (optionally on a step) with a client from `apiAs`. */
export async function attachFile(
  client: Awaited<ReturnType<typeof apiAs>>,
  caseId: string,
  file: { nodeId?: string; name: string; type: string; bytes: Buffer },
): Promise<{ id: string }> {
  const form = new FormData();
  if (file.nodeId) form.set('nodeId', file.nodeId);
  form.set('file', new Blob([new Uint8Array(file.bytes)], { type: file.type }), file.name);
  return client<{ id: string }>('POST', `/api/cases/${caseId}/attachments`, form);
}
