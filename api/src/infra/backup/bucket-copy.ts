import { createHash } from 'node:crypto';
import { createReadStream, createWriteStream } from 'node:fs';
import { rename, rm, stat } from 'node:fs/promises';
import { join } from 'node:path';
import { Readable, Transform, Writable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import {
  CreateBucketCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  NoSuchKey,
  S3Client,
  S3ServiceException,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { createS3Client, StorageSettings } from '../storage/s3-client';

export type { StorageSettings };

export interface CopiedObject {
  key: string;
  bytes: number;
  sha256: string;
  contentType?: string;
  /** The object's user metadata (x-amz-meta-*), restored with it. */
  metadata?: Record<string, string>;
}

/**
 * Copies a bucket's objects to and from a folder through the S3 API alone, so it works the same
 * against real S3 and the local fake. Files are named by their SHA-256 (identical objects are kept once).
 */
export class BucketCopier {
  private readonly client: S3Client;

  constructor(private readonly storage: StorageSettings) {
    this.client = createS3Client(storage);
  }

  get bucket(): string {
    return this.storage.bucket;
  }

  close(): void {
    this.client.destroy();
  }

  /** Every key with its size, a page at a time. */
  async *list(): AsyncGenerator<{ key: string; bytes: number }> {
    let continuationToken: string | undefined;
    do {
      const page = await this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, ContinuationToken: continuationToken }));
      for (const item of page.Contents ?? []) {
        if (item.Key) yield { key: item.Key, bytes: Number(item.Size ?? 0) };
      }
      continuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (continuationToken);
  }

  async isEmpty(): Promise<boolean> {
    // One default page: the local fake answers 500 to MaxKeys=1.
    const page = await this.client.send(new ListObjectsV2Command({ Bucket: this.bucket }));
    return (page.Contents ?? []).length === 0;
  }

  async exists(): Promise<boolean> {
    try {
      await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
      return true;
    } catch (error) {
      if (error instanceof S3ServiceException && (error.$metadata.httpStatusCode === 404 || error.name === 'NotFound')) return false;
      throw error;
    }
  }

  async create(): Promise<void> {
    await this.client.send(new CreateBucketCommand({ Bucket: this.bucket }));
  }

  async deleteAll(): Promise<number> {
    let deleted = 0;
    // List first: deleting while paging would shift the pages.
    const keys: string[] = [];
    for await (const item of this.list()) keys.push(item.key);
    for (const key of keys) {
      await this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key }));
      deleted++;
    }
    return deleted;
  }

  /**
   * Streams one object into `folder/<sha256>` while hashing it; never holds it in memory.
   * Returns null when the object was deleted between listing and reading.
   */
  async download(key: string, folder: string): Promise<CopiedObject | null> {
    let response;
    try {
      response = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    } catch (error) {
      if (error instanceof NoSuchKey) return null;
      throw error;
    }
    if (!(response.Body instanceof Readable)) throw new Error(`storage returned no readable body for ${key}`);
    const partial = join(folder, `.partial-${process.pid}`);
    const hashing = sha256Counter();
    await pipeline(response.Body, hashing.transform, createWriteStream(partial));
    const sha256 = hashing.digest();
    await rename(partial, join(folder, sha256));
    const metadata = response.Metadata && Object.keys(response.Metadata).length > 0 ? response.Metadata : undefined;
    return { key, bytes: hashing.bytes(), sha256, contentType: response.ContentType, metadata };
  }

  /** Uploads a file kept by `download` (multipart when large, as real S3 needs above 5 GB). */
  async upload(object: CopiedObject, folder: string): Promise<void> {
    const upload = new Upload({
      client: this.client,
      params: {
        Bucket: this.bucket,
        Key: object.key,
        Body: createReadStream(join(folder, object.sha256)),
        ContentType: object.contentType,
        Metadata: object.metadata,
      },
      partSize: 16 * 1024 * 1024,
      queueSize: 2,
    });
    await upload.done();
    const head = await this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: object.key }));
    if (Number(head.ContentLength) !== object.bytes) {
      throw new Error(`storage holds ${head.ContentLength} bytes for ${object.key} after upload, expected ${object.bytes}`);
    }
  }

  /** SHA-256 and size of an object as storage serves it now (used to compare copies). */
  async hashObject(key: string): Promise<{ bytes: number; sha256: string }> {
    const response = await this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key }));
    if (!(response.Body instanceof Readable)) throw new Error(`storage returned no readable body for ${key}`);
    const hashing = sha256Counter();
    await pipeline(response.Body, hashing.transform, devNull());
    return { bytes: hashing.bytes(), sha256: hashing.digest() };
  }
}

/** SHA-256 and size of a file kept in a backup folder. */
export async function hashFile(path: string): Promise<{ bytes: number; sha256: string }> {
  const hashing = sha256Counter();
  await pipeline(createReadStream(path), hashing.transform, devNull());
  const { size } = await stat(path);
  if (size !== hashing.bytes()) throw new Error(`${path} changed while it was read`);
  return { bytes: size, sha256: hashing.digest() };
}

/** Removes a download left half-written by an interrupted run. */
export async function removePartial(folder: string): Promise<void> {
  await rm(join(folder, `.partial-${process.pid}`), { force: true });
}

function sha256Counter(): { transform: Transform; digest: () => string; bytes: () => number } {
  const hash = createHash('sha256');
  let bytes = 0;
  const transform = new Transform({
    transform(chunk: Buffer, _encoding, callback) {
      hash.update(chunk);
      bytes += chunk.length;
      callback(null, chunk);
    },
  });
  return { transform, digest: () => hash.digest('hex'), bytes: () => bytes };
}

/** Consumes a stream whose bytes only need hashing. */
function devNull(): Writable {
  return new Writable({
    write(_chunk: Buffer, _encoding, callback) {
      callback();
    },
  });
}
