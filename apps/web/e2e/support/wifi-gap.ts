import net from 'node:net';

/**
 * The shop's Wi-Fi between a phone and the server: a TCP relay the phone's pages are opened through, which a test can
 * cut and restore. A cut closes every open connection and refuses new ones, below the browser, so requests a service
 * worker makes are cut as surely as the page's own (the browser's offline emulation lets some of those through).
 */
export interface WifiGap {
  /** The server's address as the phone reaches it, through the relay. */
  url: string;
  cut(): Promise<void>;
  restore(): Promise<void>;
  close(): Promise<void>;
}

export async function openWifiGap(serverUrl: string): Promise<WifiGap> {
  const target = new URL(serverUrl);
  const sockets = new Set<net.Socket>();
  const server = net.createServer((phoneSide) => {
    const serverSide = net.connect({ host: target.hostname, port: Number(target.port) });
    for (const socket of [phoneSide, serverSide]) {
      sockets.add(socket);
      socket.on('close', () => sockets.delete(socket));
      socket.on('error', () => undefined);
    }
    phoneSide.on('close', () => serverSide.destroy());
    serverSide.on('close', () => phoneSide.destroy());
    phoneSide.pipe(serverSide).pipe(phoneSide);
  });
  const listen = (port: number) =>
    new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, '127.0.0.1', () => {
        server.off('error', reject);
        resolve();
      });
    });
  const stop = () =>
    new Promise<void>((resolve) => {
      for (const socket of sockets) socket.destroy();
      if (!server.listening) return resolve();
      server.close(() => resolve());
    });
  await listen(0);
  const port = (server.address() as net.AddressInfo).port;
  return {
    url: `http://127.0.0.1:${port}`,
    cut: stop,
    restore: () => (server.listening ? Promise.resolve() : listen(port)),
    close: stop,
  };
}
