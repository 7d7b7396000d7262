import type { Server } from 'node:net';
import { MailSinkError, type ListenerRole } from './sink-error';

/** Resolves with the bound port (useful with port 0); rejects with a MailSinkError, never a raw errno. */
export function listenOn(server: Server, role: ListenerRole, host: string, port: number): Promise<number> {
  return new Promise((resolve, reject) => {
    const onError = (cause: NodeJS.ErrnoException) => {
      server.off('listening', onListening);
      reject(listenFailure(cause, role, host, port));
    };
    const onListening = () => {
      server.off('error', onError);
      const address = server.address();
      resolve(typeof address === 'object' && address !== null ? address.port : port);
    };
    server.once('error', onError);
    server.once('listening', onListening);
    server.listen(port, host);
  });
}

function listenFailure(cause: NodeJS.ErrnoException, role: ListenerRole, host: string, port: number): MailSinkError {
  const listener = { role, host, port };
  const what = role === 'smtp' ? 'SMTP' : 'HTTP';
  if (cause.code === 'EADDRINUSE') {
    return new MailSinkError('PORT_IN_USE', `port ${port} on ${host} is already in use — stop the other process or choose another ${what} port`, listener);
  }
  return new MailSinkError(
    'LISTEN_FAILED',
    `cannot listen for ${what} on ${host} port ${port} (${cause.code ?? cause.message}) — check the host and port settings`,
    listener,
  );
}
