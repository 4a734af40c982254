import type { S3Client } from '@aws-sdk/client-s3';
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
  private sdk: Promise<{ s3: S3Client; commands: typeof import('@aws-sdk/client-s3') }> | null = null;

  constructor(private readonly cfg: S3Settings) {}

  /** The client, made at the first document: the SDK costs a process ~27 MiB that most never need. */
  async client(): Promise<{ s3: S3Client; commands: typeof import('@aws-sdk/client-s3') }> {
    const cfg = this.cfg;
    this.sdk ??= import('@aws-sdk/client-s3').then((commands) => ({
      commands,
      s3: new commands.S3Client({
        endpoint: cfg.endpoint,
        region: cfg.region,
        forcePathStyle: cfg.forcePathStyle,
        ...(cfg.credentials ? { credentials: cfg.credentials } : {}),
        // plain PUTs with Content-Length: what every S3-compatible store understands
        requestChecksumCalculation: 'WHEN_REQUIRED',
        responseChecksumValidation: 'WHEN_REQUIRED',
        maxAttempts: 3,
      }),
    }));
    return this.sdk;
  }

  async put(key: string, content: Buffer, contentType: string): Promise<void> {
    const { s3, commands } = await this.client();
    await s3.send(new commands.PutObjectCommand({ Bucket: this.cfg.bucket, Key: key, Body: content, ContentType: contentType, ContentLength: content.length }));
  }

  async get(key: string): Promise<Buffer> {
    const { s3, commands } = await this.client();
    const out = await s3.send(new commands.GetObjectCommand({ Bucket: this.cfg.bucket, Key: key }));
    return Buffer.from(await out.Body!.transformToByteArray());
  }

  async delete(key: string): Promise<void> {
    const { s3, commands } = await this.client();
    await s3.send(new commands.DeleteObjectCommand({ Bucket: this.cfg.bucket, Key: key }));
  }

  async destroy(): Promise<void> {
    (await this.sdk)?.s3.destroy();
  }
}
