// A small HTTP client for API tests: keeps the session cookie and sends the CSRF token, as the
// browser client does.
/** JSON bodies are read field by field in tests; their shapes are checked with the API schemas. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- see above
export type Json = any;

export interface Reply<T = Json> {
  status: number;
  body: T;
  headers: Headers;
}

export const DEMO_PASSWORD = 'lobewright-demo';
export const demo = {
  owner: 'ada.okafor@harrowgate.example',
  editor: 'ravi.mendes@harrowgate.example',
  reviewer: 'lena.brandt@fennwick.example',
  viewer: 'tomas.reyes@fennwick.example',
  admin: 'admin@lobewright.example',
} as const;

export class ApiClient {
  private cookie = '';
  private csrf = '';

  constructor(private readonly baseUrl: string) {}

  async request<T = Json>(method: string, path: string, body?: unknown, opts: { csrf?: boolean } = {}): Promise<Reply<T>> {
    const headers: Record<string, string> = {};
    if (method !== 'GET' && opts.csrf !== false) {
      if (!this.csrf) await this.refreshSession();
      headers['x-csrf-token'] = this.csrf;
    }
    if (this.cookie) headers.cookie = this.cookie;
    if (body !== undefined) headers['content-type'] = 'application/json';
    const res = await fetch(this.baseUrl + path, {
      method,
      headers,
      body: body === undefined ? undefined : typeof body === 'string' ? body : JSON.stringify(body),
    });
    const setCookie = res.headers.getSetCookie();
    for (const c of setCookie) if (c.startsWith('lobewright.sid=')) this.cookie = c.split(';')[0];
    const text = await res.text();
    const parsed = text ? JSON.parse(text) : undefined;
    if (parsed && typeof parsed === 'object' && 'csrfToken' in parsed) this.csrf = parsed.csrfToken;
    return { status: res.status, body: parsed, headers: res.headers };
  }

  /** GET a binary body (rendered files). */
  async getBytes(path: string): Promise<{ status: number; bytes: Buffer; headers: Headers }> {
    const res = await fetch(this.baseUrl + path, { headers: this.cookie ? { cookie: this.cookie } : {} });
    return { status: res.status, bytes: Buffer.from(await res.arrayBuffer()), headers: res.headers };
  }

  /** POST multipart/form-data with one file (and text fields), as a browser form upload does. */
  async upload<T = Json>(
    path: string,
    file: { field: string; name: string; content: string | Buffer; type?: string },
    fields: Record<string, string> = {},
  ): Promise<Reply<T>> {
    if (!this.csrf) await this.refreshSession();
    const form = new FormData();
    for (const [k, v] of Object.entries(fields)) form.append(k, v);
    form.append(file.field, new Blob([typeof file.content === 'string' ? file.content : new Uint8Array(file.content)], { type: file.type ?? 'application/octet-stream' }), file.name);
    const headers: Record<string, string> = { 'x-csrf-token': this.csrf };
    if (this.cookie) headers.cookie = this.cookie;
    const res = await fetch(this.baseUrl + path, { method: 'POST', headers, body: form });
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : undefined, headers: res.headers };
  }

  async refreshSession(): Promise<Reply> {
    return this.request('GET', '/api/auth/session');
  }

  get = <T = Json>(path: string) => this.request<T>('GET', path);
  post = <T = Json>(path: string, body?: unknown) => this.request<T>('POST', path, body ?? {});
  put = <T = Json>(path: string, body?: unknown) => this.request<T>('PUT', path, body ?? {});
  patch = <T = Json>(path: string, body?: unknown) => this.request<T>('PATCH', path, body ?? {});
  delete = <T = Json>(path: string) => this.request<T>('DELETE', path);

  async signIn(email: string, password = DEMO_PASSWORD): Promise<Reply> {
    await this.refreshSession();
    const r = await this.post('/api/auth/login', { email, password });
    if (r.status !== 200) throw new Error(`sign-in as ${email} failed: ${r.status} ${JSON.stringify(r.body)}`);
    return r;
  }
}

export async function signedIn(baseUrl: string, email: string): Promise<ApiClient> {
  const c = new ApiClient(baseUrl);
  await c.signIn(email);
  return c;
}
