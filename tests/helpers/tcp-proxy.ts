import net from 'node:net';
import type { AddressInfo } from 'node:net';

export interface TcpProxy {
  port: number;
  /** Refuses new connections and cuts the open ones: to the app, the database is gone. */
  down(): Promise<void>;
  /** Listens again on the same port. */
  up(): Promise<void>;
  close(): Promise<void>;
}

/** A plain TCP relay on loopback to a real server, so a test can take that server away and back. */
export async function startTcpProxy(targetPort: number, targetHost = '127.0.0.1'): Promise<TcpProxy> {
  const sockets = new Set<net.Socket>();
  const server = net.createServer((client) => {
    const upstream = net.connect(targetPort, targetHost);
    for (const s of [client, upstream]) {
      sockets.add(s);
      s.on('close', () => sockets.delete(s));
      s.on('error', () => {
        client.destroy();
        upstream.destroy();
      });
    }
    client.pipe(upstream).pipe(client);
  });
  const listen = (port: number) => new Promise<void>((resolve) => server.listen(port, '127.0.0.1', resolve));
  await listen(0);
  const port = (server.address() as AddressInfo).port;
  const down = () =>
    new Promise<void>((resolve) => {
      server.close(() => resolve());
      for (const s of sockets) s.destroy();
    });
  return { port, down, up: () => listen(port), close: () => (server.listening ? down() : Promise.resolve()) };
}
