/** A port on 127.0.0.1 that nothing listens on now: the system's pick for port 0, let go at once for a server to take. */
import { createServer } from 'node:net';

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      probe.close(() =>
        typeof address === 'object' && address !== null ? resolve(address.port) : reject(new Error('no port')),
      );
    });
  });
}
