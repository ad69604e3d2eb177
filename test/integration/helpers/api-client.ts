import request from 'supertest';
import { Express } from 'express';
import { randomInt } from 'node:crypto';
import { CSRF_COOKIE, CSRF_HEADER } from '@server/auth';
import { TestUser } from './user-factory';

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

function cookieValue(res: request.Response, name: string): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  const cookie = raw?.find((c) => c.startsWith(`${name}=`));
  return cookie ? decodeURIComponent(cookie.split(';')[0].slice(name.length + 1)) : undefined;
}

/** A private address of its own for each client (sent as X-Forwarded-For; the test app trusts one proxy hop). */
export function randomClientAddress(): string {
  return `10.${randomInt(256)}.${randomInt(256)}.${randomInt(1, 255)}`;
}

/** An app in this process, or the base URL of a server process. */
export type ApiTarget = Express | string;

/**
 * A browser-like caller: keeps cookies and echoes the CSRF token as Angular's HttpClient does.
 * Each client comes from its own address, so per-address limits of one test never reach another.
 */
export class ApiClient {
  readonly agent: ReturnType<typeof request.agent>;
  private token = '';
  private readonly cookies = new Map<string, string>();

  /** `app` is the Express app, or the base URL of a running server process. */
  constructor(app: ApiTarget, readonly address = randomClientAddress()) {
    this.agent = request.agent(app);
    this.agent.set('X-Forwarded-For', address);
  }

  /** Starts an anonymous client that already holds its CSRF token. */
  static async anonymous(app: ApiTarget, address?: string): Promise<ApiClient> {
    const client = new ApiClient(app, address);
    await client.get('/api/auth/session');
    return client;
  }

  static async signedIn(app: ApiTarget, user: TestUser, address?: string): Promise<ApiClient> {
    const client = await ApiClient.anonymous(app, address);
    const res = await client.send('post', '/api/auth/sign-in', { email: user.email, password: user.password });
    if (res.status !== 200) throw new Error(`sign-in failed for the test user: ${res.status} ${JSON.stringify(res.body)}`);
    return client;
  }

  async get(path: string): Promise<request.Response> {
    return this.remember(await this.agent.get(path));
  }

  /** A request with the CSRF header (leave it out with `withToken: false`). */
  async send(method: Method, path: string, body?: object, withToken = true): Promise<request.Response> {
    let req = this.agent[method](path);
    if (withToken) req = req.set(CSRF_HEADER, this.token);
    return this.remember(await (body ? req.send(body) : req));
  }

  /** A multipart POST with form fields and one file, as a browser's upload form sends it. */
  async upload(path: string, fields: Record<string, string>, file: { field?: string; name: string; content: string | Buffer; contentType?: string }): Promise<request.Response> {
    let req = this.agent.post(path).set(CSRF_HEADER, this.token);
    for (const [name, value] of Object.entries(fields)) req = req.field(name, value);
    req = req.attach(file.field ?? 'file', Buffer.from(file.content), { filename: file.name, contentType: file.contentType ?? 'text/csv' });
    return this.remember(await req);
  }

  /** The CSRF token this client echoes. */
  csrfToken(): string {
    return this.token;
  }

  /** The cookies this client holds, as a Cookie header (to replay them against another app instance). */
  cookieHeader(): string {
    return [...this.cookies].map(([name, value]) => `${name}=${value}`).join('; ');
  }

  private remember(res: request.Response): request.Response {
    this.token = cookieValue(res, CSRF_COOKIE) ?? this.token;
    const raw = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
    for (const cookie of raw) {
      const [pair] = cookie.split(';');
      const at = pair.indexOf('=');
      this.cookies.set(pair.slice(0, at), pair.slice(at + 1));
    }
    return res;
  }
}
