/** A signed-in HTTP session for scripts: keeps the session cookie and sends the CSRF token on writes. */

/** One answer: status and parsed JSON body (null when not JSON). */
export interface Answer {
  status: number;
  body: any;
}

/** A browser-like session against one server. */
export class HttpSession {
  cookie = '';
  csrf = '';

  constructor(readonly baseUrl: string) {}

  /** Send a request; JSON body if given; never throws on HTTP status. */
  async request(method: string, path: string, body?: unknown): Promise<Answer> {
    const headers: Record<string, string> = {};
    if (this.cookie) headers.cookie = this.cookie;
    if (method !== 'GET') headers['x-csrf-token'] = this.csrf;
    if (body !== undefined) headers['content-type'] = 'application/json';
    const res = await fetch(this.baseUrl + path, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
    const set = res.headers.getSetCookie().find((c) => c.startsWith('heatloom.sid='));
    if (set) this.cookie = set.split(';')[0];
    const text = await res.text();
    let parsed: unknown = null;
    try { parsed = text ? JSON.parse(text) : null; } catch { parsed = null; }
    return { status: res.status, body: parsed };
  }

  /** Fetch a CSRF token, then sign in; throws when the sign-in fails. */
  async login(email: string, password: string): Promise<this> {
    this.csrf = (await this.request('GET', '/api/auth/csrf')).body.token;
    const res = await this.request('POST', '/api/auth/login', { email, password });
    if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${JSON.stringify(res.body)}`);
    if (res.body?.csrfToken) this.csrf = res.body.csrfToken;
    return this;
  }
}
