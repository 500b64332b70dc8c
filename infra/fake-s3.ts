import { mkdirSync } from 'node:fs';
import type { Server } from 'node:http';
import S3rver from 's3rver';
import { assertPortFree } from './process.ts';

export interface FakeS3Options {
  host: string;
  port: number;
  dir: string;
  bucket: string;
  /** Origins allowed to upload straight from the browser (presigned PUT). */
  allowedOrigins: string[];
}

function corsConfiguration(origins: string[]): string {
  const rules = origins
    .map(
      (origin) => `<CORSRule>
    <AllowedOrigin>${origin}</AllowedOrigin>
    <AllowedMethod>GET</AllowedMethod>
    <AllowedMethod>PUT</AllowedMethod>
    <AllowedMethod>HEAD</AllowedMethod>
    <AllowedHeader>*</AllowedHeader>
    <ExposeHeader>ETag</ExposeHeader>
    <MaxAgeSeconds>3000</MaxAgeSeconds>
  </CORSRule>`,
    )
    .join('\n  ');
  return `<CORSConfiguration>\n  ${rules}\n</CORSConfiguration>`;
}

/** A local S3-compatible server (s3rver) with the bucket created at start. */
export async function startFakeS3(options: FakeS3Options): Promise<{ stop(): Promise<void> }> {
  await assertPortFree(options.host, options.port, 'S3_PORT');
  mkdirSync(options.dir, { recursive: true });
  const s3 = new S3rver({
    address: options.host,
    port: options.port,
    directory: options.dir,
    silent: true,
    configureBuckets: [{ name: options.bucket, configs: [corsConfiguration(options.allowedOrigins)] }],
  });
  await s3.run();
  return {
    stop: async () => {
      await s3.close();
    },
  };
}

export type { Server };
