import S3rver from 's3rver';
import { mkdirSync } from 'node:fs';

/** A local S3-compatible server keeping objects under `directory`. */
export async function startFakeS3(port: number, directory: string, bucket = process.env.S3_BUCKET || 'coilwright') {
  mkdirSync(directory, { recursive: true });
  const server = new S3rver({ port, address: '127.0.0.1', directory, silent: true, configureBuckets: [{ name: bucket, configs: [] }] });
  const info = (await server.run()) as { address: string; port: number };
  return { endpoint: `http://127.0.0.1:${info.port}`, stop: () => server.close() };
}
