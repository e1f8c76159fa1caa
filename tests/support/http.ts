/** A small HTTP client that keeps its cookies and fetches a CSRF token before changing anything, like the browser. */
export class Agent {
  cookies = new Map<string, string>();
  csrf: string | null = null;
  lastSetCookie: string[] = [];
  constructor(
    public base: string,
    private headers: Record<string, string> = {},
  ) {}

  cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async raw(
    method: string,
    path: string,
    opts: { body?: unknown; headers?: Record<string, string>; rawBody?: string } = {},
  ) {
    const headers: Record<string, string> = { accept: 'application/json', ...this.headers, ...opts.headers };
    if (this.cookies.size) headers.cookie = this.cookieHeader();
    let body: string | undefined = opts.rawBody;
    if (opts.body !== undefined) {
      headers['content-type'] = 'application/json';
      body = JSON.stringify(opts.body);
    } else if (opts.rawBody !== undefined) headers['content-type'] ??= 'application/json';
    const res = await fetch(this.base + path, { method, headers, body, redirect: 'manual' });
    this.lastSetCookie = res.headers.getSetCookie();
    for (const c of this.lastSetCookie) {
      const [pair] = c.split(';');
      const i = pair.indexOf('=');
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
    const text = await res.text();
    let json: any;
    try {
      json = text ? JSON.parse(text) : null;
    } catch {
      json = null;
    }
    return { status: res.status, headers: res.headers, json, text };
  }

  async token() {
    const r = await this.raw('GET', '/api/auth/csrf');
    this.csrf = r.json.token;
    return this.csrf!;
  }

  get(path: string) {
    return this.raw('GET', path);
  }

  async send(method: 'POST' | 'PUT' | 'PATCH' | 'DELETE', path: string, body?: unknown) {
    const token = this.csrf ?? (await this.token());
    return this.raw(method, path, { body, headers: { 'x-csrf-token': token } });
  }

  post(path: string, body?: unknown) {
    return this.send('POST', path, body ?? {});
  }

  delete(path: string) {
    return this.send('DELETE', path);
  }

  /** A multipart form with one file in the field `file`, as a browser sends an upload. */
  async upload(
    path: string,
    fields: Record<string, string>,
    file: string | Uint8Array<ArrayBuffer>,
    name = 'records.csv',
  ) {
    const form = new FormData();
    for (const [k, v] of Object.entries(fields)) form.append(k, v);
    form.append('file', new Blob([file], { type: 'text/csv' }), name);
    const token = this.csrf ?? (await this.token());
    const res = await fetch(this.base + path, {
      method: 'POST',
      headers: { ...this.headers, cookie: this.cookieHeader(), 'x-csrf-token': token, accept: 'application/json' },
      body: form,
    });
    return { status: res.status, json: await res.json() };
  }

  /** Signs in and fetches the new token the new session needs. */
  async login(email: string, password: string) {
    const r = await this.post('/api/auth/login', { email, password });
    this.csrf = null;
    return r;
  }
}
