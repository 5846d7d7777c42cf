/**
 * S3-compatible storage on loopback (s3rver), so the real @aws-sdk/client-s3 is what the
 * app and the tests use. s3rver does not verify signatures; no test relies on it doing so.
 */
import { mkdirSync } from "node:fs";
import type { AddressInfo } from "node:net";
import S3rver from "s3rver";

export type S3Fake = { endpoint: string; port: number; bucket: string; close(): Promise<void> };

export async function startS3Fake(options: { port?: number; directory: string; bucket: string }): Promise<S3Fake> {
  mkdirSync(options.directory, { recursive: true });
  const server = new S3rver({
    port: options.port ?? 0,
    address: "127.0.0.1",
    silent: true,
    directory: options.directory,
    configureBuckets: [{ name: options.bucket, configs: [] }],
  });
  const address = (await server.run()) as AddressInfo;
  return {
    endpoint: `http://127.0.0.1:${address.port}`,
    port: address.port,
    bucket: options.bucket,
    close: () => server.close(),
  };
}
