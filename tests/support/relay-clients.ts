import { WebSocket } from 'ws';
import { RelayLink, type LinkStatus, type SocketLike } from '../../shared/protocol/relay-link';
import type { ClientKind, ClientMessage, ServerMessage } from '../../shared/protocol/messages';
import type { TestServer } from './test-server';

export const relayUrl = (server: TestServer) => `${server.url.replace('http', 'ws')}/relay`;

/** Signs in over HTTP and returns the Cookie header for the relay handshake. */
export async function sessionCookie(server: TestServer, email: string, password: string): Promise<string> {
  const csrf = await fetch(`${server.url}/api/auth/csrf`);
  const token = ((await csrf.json()) as { csrfToken: string }).csrfToken;
  const res = await fetch(`${server.url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: `pw_csrf=${token}`, 'x-csrf-token': token },
    body: JSON.stringify({ email, password }),
  });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status}`);
  return res.headers.getSetCookie().map((c) => c.split(';')[0]).join('; ');
}

/** A person's relay client for tests: records every message and waits for the ones it needs. */
export class TestRelayClient {
  readonly messages: ServerMessage[] = [];
  readonly statuses: LinkStatus[] = [];
  readonly link: RelayLink;
  /** The socket of the current connection (tests pause it to fake a dead link). */
  socket: WebSocket | undefined;
  private waiters: { test: (m: ServerMessage) => boolean; resolve: (m: ServerMessage) => void }[] = [];

  constructor(url: string, headers: Record<string, string>, kind: ClientKind, name: string) {
    this.link = new RelayLink(
      {
        connect: () => {
          this.socket = new WebSocket(url, { headers, perMessageDeflate: false });
          return this.socket as unknown as SocketLike;
        },
        now: () => performance.timeOrigin + performance.now(),
        setTimer: (fn, ms) => setTimeout(fn, ms),
        clearTimer: (h) => clearTimeout(h as NodeJS.Timeout),
        random: Math.random,
      },
      { hello: { kind, name } },
      {
        onMessage: (m) => {
          this.messages.push(m);
          for (const w of [...this.waiters]) {
            if (w.test(m)) {
              this.waiters.splice(this.waiters.indexOf(w), 1);
              w.resolve(m);
            }
          }
        },
        onStatus: (s) => this.statuses.push(s),
      },
    );
  }

  static async connect(url: string, headers: Record<string, string>, kind: ClientKind = 'panel', name = 'test'): Promise<TestRelayClient> {
    const client = new TestRelayClient(url, headers, kind, name);
    client.link.start();
    await client.next((m) => m.type === 'welcome');
    return client;
  }

  send(message: ClientMessage): void {
    if (!this.link.send(message)) throw new Error(`link is ${this.link.status}`);
  }

  /** The first message (already received or arriving within timeoutMs) that passes `test`. */
  next<T extends ServerMessage = ServerMessage>(test: (m: ServerMessage) => boolean, timeoutMs = 3000, includePast = true): Promise<T> {
    const past = includePast ? this.messages.find(test) : undefined;
    if (past) return Promise.resolve(past as T);
    return new Promise((resolve, reject) => {
      const timer = setTimeout(() => reject(new Error(`no matching relay message within ${timeoutMs} ms`)), timeoutMs);
      this.waiters.push({
        test,
        resolve: (m) => {
          clearTimeout(timer);
          resolve(m as T);
        },
      });
    });
  }

  /** Forgets what was received so far. */
  clear(): void {
    this.messages.length = 0;
  }

  stop(): void {
    this.link.stop();
  }
}

/** A bare socket that only says hello (for misbehaving-client tests). */
export function rawSocket(url: string, headers: Record<string, string>): Promise<WebSocket> {
  return new Promise((resolve, reject) => {
    const ws = new WebSocket(url, { headers, perMessageDeflate: false });
    ws.once('open', () => resolve(ws));
    ws.once('error', reject);
    ws.once('unexpected-response', (_req, res) => reject(new Error(`HTTP ${res.statusCode}`)));
  });
}
