import { createConnection } from 'node:net';

/** Whether something accepts TCP connections on 127.0.0.1:port right now. */
export function portAnswers(port: number): Promise<boolean> {
  return new Promise((done) => {
    const socket = createConnection({ host: '127.0.0.1', port });
    socket.once('connect', () => {
      socket.destroy();
      done(true);
    });
    socket.once('error', () => done(false));
  });
}
