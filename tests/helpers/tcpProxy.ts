import net from 'node:net';

/** A TCP relay to PostgreSQL that a test can cut, to act out a database outage without touching the server. */
export interface TcpProxy {
  port: number;
  /** refuse new connections and drop the open ones */
  cut: () => Promise<void>;
  /** accept connections again */
  restore: () => Promise<void>;
  close: () => Promise<void>;
}

export async function startTcpProxy(targetHost: string, targetPort: number): Promise<TcpProxy> {
  const sockets = new Set<net.Socket>();
  let port = 0;
  let server: net.Server;
  const listen = () =>
    new Promise<void>((resolve) => {
      server = net.createServer((client) => {
        const upstream = net.connect(targetPort, targetHost);
        for (const s of [client, upstream]) {
          sockets.add(s);
          s.on('close', () => sockets.delete(s));
          s.on('error', () => s.destroy());
        }
        client.pipe(upstream).pipe(client);
      });
      server.listen(port, '127.0.0.1', () => {
        port = (server.address() as net.AddressInfo).port;
        resolve();
      });
    });
  const stop = () =>
    new Promise<void>((resolve) => {
      for (const s of sockets) s.destroy();
      server.close(() => resolve());
    });
  await listen();
  return {
    get port() {
      return port;
    },
    cut: stop,
    restore: listen,
    close: stop,
  };
}
