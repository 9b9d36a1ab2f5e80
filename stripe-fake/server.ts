import { createServer } from 'node:http';
import type { AddressInfo } from 'node:net';
import { createStripeFake, type StripeFakeOptions } from './app';
import type { FakeState } from './state';

export interface RunningStripeFake {
  port: number;
  /** `http://127.0.0.1:<port>`: the API base and, unless `publicUrl` was given, the hosted pages' base. */
  url: string;
  state: FakeState;
  close(): Promise<void>;
}

/** Starts the fake on 127.0.0.1 (`port` 0 or none picks a free one). */
export async function startStripeFake(opts: StripeFakeOptions & { port?: number }): Promise<RunningStripeFake> {
  const fake = createStripeFake(opts);
  const server = createServer(fake.app);
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(opts.port ?? 0, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const { port } = server.address() as AddressInfo;
  const url = `http://127.0.0.1:${port}`;
  if (!opts.publicUrl) fake.setPublicUrl(url);
  return {
    port,
    url,
    state: fake.state,
    async close() {
      await fake.close();
      // The SDK keeps connections alive; close them so the port is free at once.
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
    },
  };
}
