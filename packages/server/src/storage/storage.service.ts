import { HeadBucketCommand, S3Client, type S3ClientConfig } from '@aws-sdk/client-s3';
import { Injectable, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Environment } from '../config/environment';

type S3Settings = Pick<
  Environment,
  'S3_ENDPOINT' | 'S3_REGION' | 'S3_FORCE_PATH_STYLE' | 'S3_ACCESS_KEY_ID' | 'S3_SECRET_ACCESS_KEY'
>;

/** How the server talks to S3 (or a fake of it), for the storage service and the test set-up alike. */
export function s3ClientConfig(env: S3Settings): S3ClientConfig {
  return {
    region: env.S3_REGION,
    ...(env.S3_ENDPOINT ? { endpoint: env.S3_ENDPOINT } : {}),
    forcePathStyle: env.S3_FORCE_PATH_STYLE,
    credentials: { accessKeyId: env.S3_ACCESS_KEY_ID, secretAccessKey: env.S3_SECRET_ACCESS_KEY },
    // The SDK's default checksums frame streamed uploads in a way S3-compatible fakes store verbatim.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    maxAttempts: 2,
  };
}

/** The one way to the file store: S3 through @aws-sdk/client-s3, a local fake or the real service by configuration. */
@Injectable()
export class StorageService implements OnModuleDestroy {
  readonly client: S3Client;
  readonly bucket: string;

  constructor(config: ConfigService<Environment, true>) {
    this.bucket = config.get('S3_BUCKET', { infer: true });
    this.client = new S3Client(
      s3ClientConfig({
        S3_ENDPOINT: config.get('S3_ENDPOINT', { infer: true }),
        S3_REGION: config.get('S3_REGION', { infer: true }),
        S3_FORCE_PATH_STYLE: config.get('S3_FORCE_PATH_STYLE', { infer: true }),
        S3_ACCESS_KEY_ID: config.get('S3_ACCESS_KEY_ID', { infer: true }),
        S3_SECRET_ACCESS_KEY: config.get('S3_SECRET_ACCESS_KEY', { infer: true }),
      }),
    );
  }

  async checkBucket(): Promise<void> {
    await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }), { abortSignal: AbortSignal.timeout(3000) });
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
