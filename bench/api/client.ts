// A signed-in HTTP client for the bench: one session cookie, every request timed from send to last byte.
import { performance } from 'node:perf_hooks';

export type Timed = { status: number; ms: number; body: Buffer };

export class ApiError extends Error {
  constructor(readonly status: number, what: string, body: string) {
    super(`${what} answered HTTP ${status}: ${body.slice(0, 300)}`);
  }
}

export class ApiClient {
  private cookie = '';

  constructor(readonly baseUrl: string) {}

  /** Sends one request and reads the whole answer; the time covers both. Never throws on an HTTP status. */
  async timed(method: string, path: string, body?: unknown): Promise<Timed> {
    const started = performance.now();
    const res = await fetch(`${this.baseUrl}${path}`, {
      method,
      headers: { ...(this.cookie ? { cookie: this.cookie } : {}), ...(body === undefined ? {} : { 'content-type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const bytes = Buffer.from(await res.arrayBuffer());
    return { status: res.status, ms: performance.now() - started, body: bytes };
  }

  /** The answer's JSON; throws ApiError on anything but 2xx. */
  async json<T>(method: string, path: string, body?: unknown): Promise<T> {
    const res = await this.timed(method, path, body);
    if (res.status < 200 || res.status > 299) throw new ApiError(res.status, `${method} ${path}`, res.body.toString('utf8'));
    return JSON.parse(res.body.toString('utf8')) as T;
  }

  /** Opens the answer without reading it: for time to first byte and streaming checks. */
  raw(path: string, headers: Record<string, string> = {}): Promise<Response> {
    return fetch(`${this.baseUrl}${path}`, { headers: { ...headers, cookie: this.cookie } });
  }

  async signIn(email: string, password: string): Promise<void> {
    const res = await fetch(`${this.baseUrl}/api/auth/sign-in`, {
      method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password }),
    });
    if (!res.ok) throw new ApiError(res.status, `signing in as ${email}`, await res.text());
    // Only the name=value part goes back; attributes (Path, HttpOnly, Max-Age) are for browsers.
    this.cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
  }
}
