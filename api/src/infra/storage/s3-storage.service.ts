import {
  AbortMultipartUploadCommand,
  CompleteMultipartUploadCommand,
  CreateMultipartUploadCommand,
  DeleteObjectCommand,
  GetObjectCommand,
  HeadBucketCommand,
  HeadObjectCommand,
  ListObjectsV2Command,
  PutObjectCommand,
  S3Client,
  S3ServiceException,
  UploadPartCommand,
} from '@aws-sdk/client-s3';
import { Upload } from '@aws-sdk/lib-storage';
import { getSignedUrl } from '@aws-sdk/s3-request-presigner';
import { Inject, Injectable, Logger, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { createReadStream } from 'node:fs';
import { AppConfig } from '../../config/app-config';
import { createS3Client } from './s3-client';
import { StorageService } from './storage.service';
import { isStorageUnavailable, multipartRefusal, StorageUnavailableError } from './storage-errors';

/** The storage port on S3 (or any S3-compatible store): the only place that talks to S3. */
@Injectable()
export class S3StorageService extends StorageService implements OnModuleDestroy {
  private readonly logger = new Logger(S3StorageService.name);
  private readonly client: S3Client;
  /** Signs URLs for browsers, which may reach storage at another address than the API does. */
  private readonly publicClient: S3Client;
  readonly bucket: string;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    super();
    const storage = config.get('storage', { infer: true });
    this.bucket = storage.bucket;
    this.client = createS3Client(storage, { timeouts: true });
    this.publicClient = createS3Client(storage, { endpoint: storage.publicEndpoint });
  }

  /** Stores a small object held in memory (logos, photos); large media goes browser → storage directly. */
  async putObject(key: string, body: Buffer, contentType: string): Promise<void> {
    await this.reach(() =>
      this.client.send(new PutObjectCommand({ Bucket: this.bucket, Key: key, Body: body, ContentType: contentType })),
    );
  }

  /**
   * Stores a file from local disk without holding it in memory (media the API makes: renditions,
   * segments); large files go up in 16 MiB parts.
   */
  async putFile(key: string, path: string, contentType: string): Promise<void> {
    await this.reach(async () => {
      const upload = new Upload({
        client: this.client,
        params: { Bucket: this.bucket, Key: key, Body: createReadStream(path), ContentType: contentType },
        partSize: 16 * 1024 * 1024,
        queueSize: 2,
      });
      await upload.done();
    });
  }

  /** Every key under `prefix`, a page at a time. */
  async listKeys(prefix: string): Promise<string[]> {
    const keys: string[] = [];
    let continuationToken: string | undefined;
    do {
      const page = await this.reach(() =>
        this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix, ContinuationToken: continuationToken })),
      );
      for (const item of page.Contents ?? []) if (item.Key) keys.push(item.Key);
      continuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (continuationToken);
    return keys;
  }

  /** Reads a whole object into memory; meant for small objects. */
  async getObject(key: string): Promise<{ body: Buffer; contentType?: string }> {
    const result = await this.reach(() => this.client.send(new GetObjectCommand({ Bucket: this.bucket, Key: key })));
    const bytes = result.Body ? await result.Body.transformToByteArray() : new Uint8Array();
    return { body: Buffer.from(bytes), contentType: result.ContentType };
  }

  /** Deletes an object; deleting a missing key is not an error (as on S3). */
  async deleteObject(key: string): Promise<void> {
    await this.reach(() => this.client.send(new DeleteObjectCommand({ Bucket: this.bucket, Key: key })));
  }

  /**
   * Deletes every object whose key starts with `prefix` (a whole workshop's files), a page of keys at a
   * time; returns how many. One DeleteObject per key, as the local S3 fake lacks the batch call.
   */
  async deletePrefix(prefix: string): Promise<number> {
    let deleted = 0;
    let continuationToken: string | undefined;
    do {
      const page = await this.reach(() =>
        this.client.send(new ListObjectsV2Command({ Bucket: this.bucket, Prefix: prefix, ContinuationToken: continuationToken })),
      );
      const keys = (page.Contents ?? []).map((item) => item.Key).filter((key): key is string => !!key);
      for (const key of keys) await this.deleteObject(key);
      deleted += keys.length;
      continuationToken = page.IsTruncated ? page.NextContinuationToken : undefined;
    } while (continuationToken);
    return deleted;
  }

  /** A time-limited GET link a browser can use without credentials. */
  async presignedGetUrl(key: string, expiresInSeconds = 3600): Promise<string> {
    return getSignedUrl(this.publicClient, new GetObjectCommand({ Bucket: this.bucket, Key: key }), {
      expiresIn: expiresInSeconds,
    });
  }

  /* ---------------------------------------------------------------- multipart uploads (footage) */

  /** Starts a multipart upload the browser fills part by part with presigned URLs; returns its upload id. */
  async createMultipartUpload(key: string, contentType: string): Promise<string> {
    const result = await this.reach(() =>
      this.client.send(new CreateMultipartUploadCommand({ Bucket: this.bucket, Key: key, ContentType: contentType })),
    );
    if (!result.UploadId) throw new Error('Storage started a multipart upload without an upload id');
    return result.UploadId;
  }

  /** A time-limited PUT link for one part; the browser sends the bytes itself and reads the ETag header. */
  async presignedUploadPartUrl(key: string, uploadId: string, partNumber: number, expiresInSeconds: number): Promise<string> {
    return getSignedUrl(
      this.publicClient,
      new UploadPartCommand({ Bucket: this.bucket, Key: key, UploadId: uploadId, PartNumber: partNumber }),
      { expiresIn: expiresInSeconds },
    );
  }

  /**
   * Assembles the object from its parts; `parts` come from our own records (the S3 fake has no
   * ListParts). Storage itself checks each part's ETag against what it holds: its refusal
   * (InvalidPart, InvalidPartOrder, NoSuchUpload) is thrown as a `MultipartRefusedError` naming the part.
   */
  async completeMultipartUpload(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]): Promise<void> {
    try {
      await this.reach(() =>
        this.client.send(
          new CompleteMultipartUploadCommand({
            Bucket: this.bucket,
            Key: key,
            UploadId: uploadId,
            MultipartUpload: { Parts: parts.map((part) => ({ PartNumber: part.partNumber, ETag: part.etag })) },
          }),
        ),
      );
    } catch (error) {
      throw multipartRefusal(error) ?? error;
    }
  }

  /**
   * Cancels a multipart upload so storage drops its parts. Returns false when storage could not
   * (the upload is already gone, or the store does not implement the call, as the local S3 fake
   * answers 405); a bucket lifecycle rule cleans such leftovers on real S3.
   */
  async abortMultipartUpload(key: string, uploadId: string): Promise<boolean> {
    try {
      await this.reach(() => this.client.send(new AbortMultipartUploadCommand({ Bucket: this.bucket, Key: key, UploadId: uploadId })));
      return true;
    } catch (error) {
      const status = error instanceof S3ServiceException ? error.$metadata.httpStatusCode : undefined;
      if (status === 404 || status === 405 || status === 501) return false;
      throw error;
    }
  }

  /** Size and type of a stored object, or null when there is none. */
  async headObject(key: string): Promise<{ sizeBytes: number; contentType?: string } | null> {
    try {
      const result = await this.reach(() => this.client.send(new HeadObjectCommand({ Bucket: this.bucket, Key: key })));
      return { sizeBytes: result.ContentLength ?? 0, contentType: result.ContentType };
    } catch (error) {
      if (error instanceof S3ServiceException && error.$metadata.httpStatusCode === 404) return null;
      throw error;
    }
  }

  /** A time-limited GET link for the API's own tools (ffprobe, ffmpeg), at the address the API reaches storage. */
  async internalGetUrl(key: string, expiresInSeconds: number): Promise<string> {
    return getSignedUrl(this.client, new GetObjectCommand({ Bucket: this.bucket, Key: key }), {
      expiresIn: expiresInSeconds,
    });
  }

  async ping(): Promise<void> {
    await this.reach(() => this.client.send(new HeadBucketCommand({ Bucket: this.bucket })));
  }

  /** Runs one storage request; "storage is not there" becomes a 503 for whoever asked. */
  private async reach<T>(request: () => Promise<T>): Promise<T> {
    try {
      return await request();
    } catch (error) {
      if (isStorageUnavailable(error)) {
        this.logger.warn(`storage unavailable: ${errorText(error)}`);
        throw new StorageUnavailableError(errorText(error));
      }
      throw error;
    }
  }

  onModuleDestroy(): void {
    this.client.destroy();
    this.publicClient.destroy();
  }
}

function errorText(error: unknown): string {
  if (error instanceof AggregateError) return error.errors.map(errorText).join('; ');
  return error instanceof Error ? `${error.name}: ${error.message}` : String(error);
}
