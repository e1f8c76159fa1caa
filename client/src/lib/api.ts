import { currentLanguage, tr } from './i18n';

/**
 * The one API client: JSON in and out, the session cookie, the CSRF token on every state-changing call, and the
 * reader's language as Accept-Language, so the server's messages come back in it.
 */
export class ApiError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fields?: Record<string, string>,
  ) {
    super(message);
  }
}

let csrfToken: string | null = null;

async function fetchCsrf(): Promise<string> {
  const res = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
  const data = await res.json();
  csrfToken = data.token;
  return data.token;
}

/** After sign-in or sign-out the session changes, and with it the token. */
export const forgetCsrfToken = () => {
  csrfToken = null;
};

async function parse(res: Response) {
  if (res.status === 204) return undefined;
  const type = res.headers.get('content-type') ?? '';
  const data = type.includes('json') ? await res.json() : null;
  if (!res.ok) {
    const e = data?.error;
    throw new ApiError(
      res.status,
      e?.code ?? 'http',
      e?.message ?? tr('common.error.status', { status: res.status }),
      e?.fields,
    );
  }
  return data;
}

export async function api<T>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  url: string,
  body?: unknown,
  extraHeaders: Record<string, string> = {},
): Promise<T> {
  const form = typeof FormData !== 'undefined' && body instanceof FormData;
  const send = async (): Promise<Response> => {
    const headers: Record<string, string> = {
      Accept: 'application/json',
      'Accept-Language': currentLanguage(),
      ...extraHeaders,
    };
    if (body !== undefined && !form) headers['Content-Type'] = 'application/json';
    if (method !== 'GET') headers['x-csrf-token'] = csrfToken ?? (await fetchCsrf());
    try {
      return await fetch(url, {
        method,
        headers,
        credentials: 'same-origin',
        // Public reads may be kept by shared caches for a few seconds; the app itself always asks again, and an
        // unchanged answer comes back as a cheap 304.
        cache: 'no-cache',
        body: body === undefined ? undefined : form ? (body as FormData) : JSON.stringify(body),
      });
    } catch {
      throw new ApiError(0, 'offline', tr('common.error.offline'));
    }
  };
  let res = await send();
  if (res.status === 403 && method !== 'GET') {
    // The token may belong to a session that ended; fetch a fresh one once.
    const copy = res.clone();
    const data = await copy.json().catch(() => null);
    if (data?.error?.code === 'csrf') {
      await fetchCsrf();
      res = await send();
    }
  }
  return parse(res) as Promise<T>;
}
