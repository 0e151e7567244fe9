import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Express } from 'express';
import { PASSWORD } from './test-app';

/**
 * A real listening server on 127.0.0.1 and plain keep-alive HTTP clients with their own cookies:
 * many thousands of requests over a few sockets, bodies sent byte for byte as written (JSON that
 * no serializer would write, a multipart form cut short).
 */
export interface Served {
  base: string;
  agent: http.Agent;
  close: () => Promise<void>;
}

export async function serve(app: Express): Promise<Served> {
  const server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const { port } = server.address() as AddressInfo;
  const agent = new http.Agent({ keepAlive: true, maxSockets: 4 });
  return {
    base: `http://127.0.0.1:${port}`,
    agent,
    close: async () => {
      agent.destroy();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}

export interface Answer {
  status: number;
  headers: http.IncomingHttpHeaders;
  text: string;
  /** The body read as JSON, or undefined when it is not JSON. */
  json: unknown;
}

export interface Send {
  /** Serialized with JSON.stringify. */
  json?: unknown;
  /** Sent as is, with `contentType`. */
  raw?: string | Buffer;
  contentType?: string;
  headers?: Record<string, string>;
}

export class Client {
  private cookies = new Map<string, string>();
  csrf = '';

  constructor(private served: Served) {}

  async request(method: string, path: string, send: Send = {}): Promise<Answer> {
    const body =
      send.raw !== undefined
        ? Buffer.from(send.raw)
        : send.json !== undefined
          ? Buffer.from(JSON.stringify(send.json))
          : undefined;
    const headers: Record<string, string> = {
      ...(this.cookies.size
        ? { cookie: [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ') }
        : {}),
      ...(method !== 'GET' && this.csrf ? { 'x-csrf-token': this.csrf } : {}),
      ...(body
        ? {
            'content-type': send.contentType ?? 'application/json',
            'content-length': String(body.length),
          }
        : {}),
      ...send.headers,
    };
    const url = new URL(path, this.served.base);
    return new Promise<Answer>((resolve, reject) => {
      const req = http.request(url, { method, headers, agent: this.served.agent }, (res) => {
        const chunks: Buffer[] = [];
        res.on('data', (c: Buffer) => chunks.push(c));
        res.on('error', reject);
        res.on('end', () => {
          for (const line of res.headers['set-cookie'] ?? []) {
            const [pair] = line.split(';');
            const eq = pair.indexOf('=');
            const name = pair.slice(0, eq).trim();
            const value = pair.slice(eq + 1).trim();
            if (value === '' || /expires=Thu, 01 Jan 1970/i.test(line)) this.cookies.delete(name);
            else this.cookies.set(name, value);
          }
          const text = Buffer.concat(chunks).toString('utf8');
          let json: unknown;
          if (/json/.test(String(res.headers['content-type'] ?? '')))
            try {
              json = JSON.parse(text);
            } catch {
              json = undefined;
            }
          resolve({ status: res.statusCode ?? 0, headers: res.headers, text, json });
        });
      });
      req.on('error', reject);
      req.end(body);
    });
  }

  /** A fresh CSRF token for the current session (or cookie-only id, signed out). */
  async refreshCsrf() {
    const res = await this.request('GET', '/api/auth/csrf');
    this.csrf = (res.json as { token: string }).token;
    return this;
  }
}

/** A visitor holding a CSRF token, not signed in. */
export const anonymousClient = (served: Served) => new Client(served).refreshCsrf();

/** A signed-in client with a CSRF token for its session. */
export async function signedInClient(served: Served, email: string, password = PASSWORD) {
  const client = await anonymousClient(served);
  const res = await client.request('POST', '/api/auth/login', { json: { email, password } });
  if (res.status !== 200) throw new Error(`sign-in of ${email} failed: ${res.status} ${res.text}`);
  return client.refreshCsrf();
}

/** A multipart form body with these text fields and an optional file in the field `file`. */
export function multipart(
  fields: Record<string, string>,
  file?: { name: string; type: string; bytes: Buffer },
) {
  const boundary = `----clearwood${Math.random().toString(16).slice(2)}`;
  const parts: Buffer[] = [];
  for (const [k, v] of Object.entries(fields))
    parts.push(
      Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`),
    );
  if (file)
    parts.push(
      Buffer.from(
        `--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${file.name}"\r\n` +
          `Content-Type: ${file.type}\r\n\r\n`,
      ),
      file.bytes,
      Buffer.from('\r\n'),
    );
  parts.push(Buffer.from(`--${boundary}--\r\n`));
  return { raw: Buffer.concat(parts), contentType: `multipart/form-data; boundary=${boundary}` };
}
