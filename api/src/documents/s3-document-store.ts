import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand, S3Client } from '@aws-sdk/client-s3';
import type { DocumentStore } from './document-store.js';

export interface S3Settings {
  endpoint: string;
  bucket: string;
  region: string;
  /** Static keys, or null for the SDK's default credential chain. */
  credentials: { accessKeyId: string; secretAccessKey: string } | null;
  forcePathStyle: boolean;
}

/**
 * Document bytes in S3-compatible object storage, through the AWS SDK: the store for several API
 * processes. Development and tests point S3_ENDPOINT at the stand-in in fakes/object-store.ts.
 */
export class S3DocumentStore implements DocumentStore {
  readonly s3: S3Client;

  constructor(private readonly cfg: S3Settings) {
    this.s3 = new S3Client({
      endpoint: cfg.endpoint,
      region: cfg.region,
      forcePathStyle: cfg.forcePathStyle,
      ...(cfg.credentials ? { credentials: cfg.credentials } : {}),
      // plain PUTs with Content-Length: what every S3-compatible store understands
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
      maxAttempts: 3,
    });
  }

  async put(key: string, content: Buffer, contentType: string): Promise<void> {
    await this.s3.send(new PutObjectCommand({ Bucket: this.cfg.bucket, Key: key, Body: content, ContentType: contentType, ContentLength: content.length }));
  }

  async get(key: string): Promise<Buffer> {
    const out = await this.s3.send(new GetObjectCommand({ Bucket: this.cfg.bucket, Key: key }));
    return Buffer.from(await out.Body!.transformToByteArray());
  }

  async delete(key: string): Promise<void> {
    await this.s3.send(new DeleteObjectCommand({ Bucket: this.cfg.bucket, Key: key }));
  }

  destroy(): void {
    this.s3.destroy();
  }
}
