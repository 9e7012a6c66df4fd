/** The one HTTP helper of the client: JSON in/out, CSRF header on writes, typed errors. */

/** An error answered by the server, with its code and details. */
export class ApiError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public details?: unknown,
  ) {
    super(message);
  }
}

let csrfToken: string | null = null;

/** Forget the CSRF token (after sign-in/out the session changes). */
export function resetCsrf(): void {
  csrfToken = null;
}

async function fetchCsrf(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  const body = await res.json();
  csrfToken = body.token as string;
  return csrfToken;
}

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

async function send<T>(method: Method, url: string, body?: unknown, retried = false): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = csrfToken ?? (await fetchCsrf());
  const res = await fetch(url, {
    method,
    headers,
    credentials: 'same-origin',
    body: body === undefined ? undefined : JSON.stringify(body),
  });
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data = text ? safeJson(text) : undefined;
  if (!res.ok) {
    const err = (data as { error?: { code?: string; message?: string; details?: unknown } } | undefined)?.error;
    if (res.status === 403 && err?.code === 'csrf' && !retried) {
      await fetchCsrf();
      return send<T>(method, url, body, true);
    }
    throw new ApiError(res.status, err?.code ?? 'http', err?.message ?? `Request failed (${res.status})`, err?.details);
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try {
    return JSON.parse(text);
  } catch {
    return { error: { code: 'bad_response', message: text.slice(0, 200) } };
  }
}

/** Typed verbs over fetch. */
export const http = {
  get: <T>(url: string) => send<T>('GET', url),
  post: <T>(url: string, body?: unknown) => send<T>('POST', url, body ?? {}),
  put: <T>(url: string, body: unknown) => send<T>('PUT', url, body),
  patch: <T>(url: string, body: unknown) => send<T>('PATCH', url, body),
  del: <T>(url: string) => send<T>('DELETE', url),
};
