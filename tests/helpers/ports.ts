import { createServer } from 'node:net';
import type { AddressInfo } from 'node:net';

/** A free loopback port, for a server that must be named before it starts. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const p = (s.address() as AddressInfo).port;
      s.close(() => resolve(p));
    });
  });
}
