import { CopyObjectCommand, DeleteObjectCommand, GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import { Injectable, Logger } from '@nestjs/common';
import { randomUUID } from 'node:crypto';
import { Readable } from 'node:stream';
import { StorageService } from '../storage/storage.service';
import { StorageUnavailableError } from './plans.errors';

/** Long enough for a slow store, short enough that an upload request fails while the person still waits. */
const STORAGE_TIMEOUT_MS = 15_000;

/** The files of plans in the bucket: drawings and attachments, each under a key of its own. */
@Injectable()
export class PlanFilesService {
  private readonly logger = new Logger(PlanFilesService.name);

  constructor(private readonly storage: StorageService) {}

  newKey(planId: number, revisionId: number, kind: 'drawings' | 'attachments'): string {
    return `plans/${planId}/revisions/${revisionId}/${kind}/${randomUUID()}`;
  }

  async put(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.guard((options) =>
      this.storage.client.send(
        new PutObjectCommand({ Bucket: this.storage.bucket, Key: key, Body: body, ContentType: contentType }),
        options,
      ),
    );
  }

  async copy(from: string, to: string): Promise<void> {
    await this.guard((options) =>
      this.storage.client.send(
        new CopyObjectCommand({
          Bucket: this.storage.bucket,
          CopySource: `${this.storage.bucket}/${encodeURI(from)}`,
          Key: to,
        }),
        options,
      ),
    );
  }

  async delete(key: string): Promise<void> {
    await this.guard((options) =>
      this.storage.client.send(new DeleteObjectCommand({ Bucket: this.storage.bucket, Key: key }), options),
    );
  }

  /** Removes objects that no row refers to any more; a failure is logged, not thrown, as the caller is already failing. */
  async discard(keys: readonly string[]): Promise<void> {
    for (const key of keys) {
      await this.delete(key).catch((error: unknown) =>
        this.logger.error(`could not remove the stray object ${key}: ${String(error)}`),
      );
    }
  }

  async read(key: string): Promise<Buffer> {
    const object = await this.guard((options) =>
      this.storage.client.send(new GetObjectCommand({ Bucket: this.storage.bucket, Key: key }), options),
    );
    if (!object.Body) throw new StorageUnavailableError();
    return Buffer.from(await object.Body.transformToByteArray());
  }

  async stream(key: string): Promise<Readable> {
    const object = await this.guard((options) =>
      this.storage.client.send(new GetObjectCommand({ Bucket: this.storage.bucket, Key: key }), options),
    );
    // In Node the SDK hands the body over as a stream.
    if (!(object.Body instanceof Readable)) throw new StorageUnavailableError();
    return object.Body;
  }

  private async guard<T>(work: (options: { abortSignal: AbortSignal }) => Promise<T>): Promise<T> {
    try {
      return await work({ abortSignal: AbortSignal.timeout(STORAGE_TIMEOUT_MS) });
    } catch (error) {
      this.logger.warn(`storage: ${error instanceof Error ? error.message : String(error)}`);
      throw new StorageUnavailableError();
    }
  }
}
