import { createServer, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { Logger } from 'pino';
import type { DataSource } from 'typeorm';
import { createApp } from './app';
import type { AppConfig } from './config';

export interface RunningHttpServer {
  server: Server;
  url: string;
  port: number;
  close(): Promise<void>;
}

/** Serves the app on host:port (0 picks a free port). */
export async function startHttpServer(options: {
  dataSource: DataSource;
  config: AppConfig;
  port: number;
  host?: string;
  logger?: Logger;
}): Promise<RunningHttpServer> {
  const host = options.host ?? '127.0.0.1';
  const app = createApp({ dataSource: options.dataSource, config: options.config, logger: options.logger });
  const server = createServer(app);
  server.keepAliveTimeout = 5_000;
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  return {
    server,
    port,
    url: `http://${host}:${port}`,
    close: () => closeGracefully(server),
  };
}

/** How long requests already running may take to finish when the server stops. */
const DRAIN_MS = 5_000;

/**
 * Stops accepting, lets requests already running finish (so none meets a closed database pool),
 * closes keep-alive connections as they fall idle, and cuts whatever is left after DRAIN_MS.
 */
function closeGracefully(server: Server): Promise<void> {
  return new Promise<void>((resolve) => {
    const idle = setInterval(() => server.closeIdleConnections(), 50);
    const force = setTimeout(() => server.closeAllConnections(), DRAIN_MS);
    server.close(() => {
      clearInterval(idle);
      clearTimeout(force);
      resolve();
    });
    server.closeIdleConnections();
  });
}
