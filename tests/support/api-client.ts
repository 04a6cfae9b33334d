/** Test bodies are read loosely: the assertions check their shape. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type Loose = any;

/** A small fetch wrapper for API tests: JSON in, parsed JSON or text out, status and headers kept. */
export interface ApiResponse<T = Loose> {
  status: number;
  headers: Headers;
  body: T;
  text: string;
}

export interface CallOptions {
  token?: string;
  body?: unknown;
  /** Sent as is (e.g. malformed JSON or a FormData upload). */
  rawBody?: BodyInit;
  headers?: Record<string, string>;
}

export class ApiClient {
  constructor(readonly baseUrl: string) {}

  async call<T = Loose>(method: string, path: string, options: CallOptions = {}): Promise<ApiResponse<T>> {
    const headers: Record<string, string> = { accept: 'application/json', ...(options.headers ?? {}) };
    if (options.token) headers['authorization'] = `Bearer ${options.token}`;
    let body: BodyInit | undefined = options.rawBody;
    if (options.body !== undefined) {
      body = JSON.stringify(options.body);
      headers['content-type'] ??= 'application/json';
    }
    const response = await fetch(this.baseUrl + path, { method, headers, body });
    const text = await response.text();
    let parsed: unknown = text;
    if (/json/.test(response.headers.get('content-type') ?? '') && text) parsed = JSON.parse(text);
    return { status: response.status, headers: response.headers, body: parsed as T, text };
  }

  get<T = Loose>(path: string, options?: CallOptions) {
    return this.call<T>('GET', path, options);
  }
  post<T = Loose>(path: string, body?: unknown, options: CallOptions = {}) {
    return this.call<T>('POST', path, { ...options, body });
  }
  patch<T = Loose>(path: string, body?: unknown, options: CallOptions = {}) {
    return this.call<T>('PATCH', path, { ...options, body });
  }
  put<T = Loose>(path: string, body?: unknown, options: CallOptions = {}) {
    return this.call<T>('PUT', path, { ...options, body });
  }
  delete<T = Loose>(path: string, options?: CallOptions) {
    return this.call<T>('DELETE', path, options);
  }
}
