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
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
