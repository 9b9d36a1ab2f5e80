import S3rver from 's3rver';
import { mkdirSync } from 'node:fs';

export interface S3Fake {
  port: number;
  close(): Promise<void>;
}

/** The local S3-compatible store for development and tests (s3rver, files under a folder). */
export async function startS3Fake(opts: { port?: number; directory: string; bucket: string }): Promise<S3Fake> {
  mkdirSync(opts.directory, { recursive: true });
  const server = new S3rver({
    port: opts.port ?? 0,
    address: '127.0.0.1',
    directory: opts.directory,
    silent: true,
    configureBuckets: [{ name: opts.bucket, configs: [] }],
  });
  const address = (await server.run()) as { port: number };
  return { port: address.port, close: () => server.close() };
}
