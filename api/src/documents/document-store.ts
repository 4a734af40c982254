import fs from 'node:fs/promises';
import path from 'node:path';

/**
 * Where document bytes live. The database keeps what a document is (system, kind, name, size,
 * SHA-256) and its storage key; the store keeps the bytes under that key. The filesystem store
 * serves one machine; an object-storage store (S3 API) is the one for several API processes.
 */
export interface DocumentStore {
  put(key: string, content: Buffer, contentType: string): Promise<void>;
  get(key: string): Promise<Buffer>;
  delete(key: string): Promise<void>;
}

export const DOCUMENT_STORE = Symbol('DOCUMENT_STORE');

/** Keys are made by the service from UUIDs (`<org>/<document>.pdf`); anything else is refused. */
const KEY = /^[0-9a-f-]{36}\/[0-9a-f-]{36}\.pdf$/;

export class FilesystemDocumentStore implements DocumentStore {
  constructor(private readonly root: string) {}

  private file(key: string): string {
    if (!KEY.test(key)) throw new Error(`not a document key: ${key}`);
    return path.join(this.root, key);
  }

  async put(key: string, content: Buffer): Promise<void> {
    const file = this.file(key);
    await fs.mkdir(path.dirname(file), { recursive: true });
    // write beside, then rename: a reader never sees half a file
    const partial = `${file}.${process.pid}.partial`;
    await fs.writeFile(partial, content, { flag: 'wx' });
    await fs.rename(partial, file);
  }

  async get(key: string): Promise<Buffer> {
    return fs.readFile(this.file(key));
  }

  async delete(key: string): Promise<void> {
    await fs.rm(this.file(key), { force: true });
  }
}
