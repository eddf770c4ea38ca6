// Starts the HTTP server for an already migrated data source. Importing this file starts nothing.
import { once } from 'node:events';
import type { AddressInfo } from 'node:net';
import type { DataSource } from 'typeorm';
import { createApp } from './app';
import { sweepExpiredSessions } from './auth/session-sweeper';
import { loadConfig } from './config';

export interface StartServerOptions {
  dataSource: DataSource;
  port: number;
  host: string;
  clientDir?: string;
  publicOrigin?: string;
}

export interface RunningServer {
  url: string;
  close(): Promise<void>;
}

export async function startServer(opts: StartServerOptions): Promise<RunningServer> {
  if (!opts.dataSource.isInitialized) await opts.dataSource.initialize();
  // Parsing the whole environment here makes a bad setting stop the start with a readable list.
  const config = loadConfig();
  const app = createApp({
    dataSource: opts.dataSource,
    clientDir: opts.clientDir,
    publicOrigin: opts.publicOrigin ?? config.PUBLIC_ORIGIN,
    trustProxy: config.TRUST_PROXY,
    listenHost: opts.host,
    allowedHosts: config.ALLOWED_HOSTS,
  });
  const server = app.listen(opts.port, opts.host);
  await once(server, 'listening');
  const stopSweeping = sweepExpiredSessions(opts.dataSource);
  const { port } = server.address() as AddressInfo;
  const host = opts.host.includes(':') ? `[${opts.host}]` : opts.host;
  return {
    url: `http://${host}:${port}`,
    close: () =>
      new Promise<void>((resolve, reject) => {
        stopSweeping();
        server.close((error) => (error ? reject(error) : resolve()));
        server.closeAllConnections();
      }),
  };
}
