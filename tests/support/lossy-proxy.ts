/**
 * A TCP proxy on a free loopback port in front of an HTTP server that can lose answers: a request
 * it was told to pick goes through to the server as sent, but when the server's answer starts to
 * come back the proxy closes the client's connection (and the server's) without passing on a
 * byte, as a phone's connection drops while the server is answering. The server did the work; the
 * client only sees the connection go.
 */
import { createServer, connect, type Server, type Socket } from 'node:net';
import { freePort } from '../../server/db/free-port';

export interface LossyProxy {
  /** http://127.0.0.1:port */
  url: string;
  /**
   * The next request whose head (request line and headers, as text) matches has its answer lost.
   * Resolves once that answer has been dropped.
   */
  loseAnswerTo(match: (head: string) => boolean): Promise<void>;
  stop(): Promise<void>;
}

/** Starts the proxy in front of 127.0.0.1:`targetPort`. */
export async function startLossyProxy(targetPort: number): Promise<LossyProxy> {
  const pending: { match: (head: string) => boolean; dropped: () => void }[] = [];
  const sockets = new Set<Socket>();

  const server: Server = createServer((client) => {
    const upstream = connect(targetPort, '127.0.0.1');
    sockets.add(client).add(upstream);
    // What the client sent, as text, from the start of the request not yet read; requests
    // come one after another on a kept-alive connection, each a head and Content-Length bytes.
    let unread = '';
    let bodyLeft = 0;
    let doomed: (() => void) | null = null;
    const cut = () => {
      client.destroy();
      upstream.destroy();
    };
    client.on('data', (chunk: Buffer) => {
      upstream.write(chunk);
      unread += chunk.toString('latin1');
      for (;;) {
        const skipped = Math.min(bodyLeft, unread.length);
        bodyLeft -= skipped;
        unread = unread.slice(skipped);
        const end = bodyLeft ? -1 : unread.indexOf('\r\n\r\n');
        if (end < 0) return;
        const head = unread.slice(0, end);
        unread = unread.slice(end + 4);
        bodyLeft = Number(/\r\ncontent-length:\s*(\d+)/i.exec(head)?.[1] ?? 0);
        const found = pending.findIndex((p) => p.match(head));
        if (found >= 0) doomed = pending.splice(found, 1)[0]!.dropped;
      }
    });
    upstream.on('data', (chunk: Buffer) => {
      if (doomed) {
        const dropped = doomed;
        doomed = null;
        cut();
        dropped();
        return;
      }
      client.write(chunk);
    });
    client.on('end', () => upstream.end());
    upstream.on('end', () => client.end());
    client.on('error', cut);
    upstream.on('error', cut);
    client.on('close', () => sockets.delete(client));
    upstream.on('close', () => sockets.delete(upstream));
  });
  const port = await freePort();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  return {
    url: `http://127.0.0.1:${port}`,
    loseAnswerTo(match) {
      return new Promise<void>((dropped) => pending.push({ match, dropped }));
    },
    async stop() {
      for (const socket of sockets) socket.destroy();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
