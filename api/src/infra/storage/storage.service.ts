/**
 * The storage port: every object the app keeps (photos, logos, footage, renditions) goes through it. It is
 * also the injection token: `InfraModule` binds the driver `STORAGE_DRIVER` names (`s3`: `S3StorageService`,
 * any S3-compatible store, the local fake included), so a hosted provider's driver replaces it by
 * configuration. A driver throws `StorageUnavailableError` when the store cannot be reached (a 503 for the
 * caller) and `MultipartRefusedError` when the store refuses a multipart assembly (`storage-errors.ts`).
 */
export abstract class StorageService {
  /** Stores a small object held in memory (logos, photos); large media goes browser → storage directly. */
  abstract putObject(key: string, body: Buffer, contentType: string): Promise<void>;

  /** Stores a file from local disk without holding it in memory (media the API makes: renditions, segments). */
  abstract putFile(key: string, path: string, contentType: string): Promise<void>;

  /** Every key under `prefix`. */
  abstract listKeys(prefix: string): Promise<string[]>;

  /** Reads a whole object into memory; meant for small objects. */
  abstract getObject(key: string): Promise<{ body: Buffer; contentType?: string }>;

  /** Deletes an object; deleting a missing key is not an error. */
  abstract deleteObject(key: string): Promise<void>;

  /** Deletes every object whose key starts with `prefix` (a whole workshop's files); returns how many. */
  abstract deletePrefix(prefix: string): Promise<number>;

  /** A time-limited GET link a browser can use without credentials. */
  abstract presignedGetUrl(key: string, expiresInSeconds?: number): Promise<string>;

  /** Starts a multipart upload the browser fills part by part with presigned URLs; returns its upload id. */
  abstract createMultipartUpload(key: string, contentType: string): Promise<string>;

  /** A time-limited PUT link for one part; the browser sends the bytes itself and reads the ETag header. */
  abstract presignedUploadPartUrl(key: string, uploadId: string, partNumber: number, expiresInSeconds: number): Promise<string>;

  /** Assembles the object from its parts (from our own records); the store checks each part's ETag. */
  abstract completeMultipartUpload(key: string, uploadId: string, parts: { partNumber: number; etag: string }[]): Promise<void>;

  /** Cancels a multipart upload so the store drops its parts; false when the store could not. */
  abstract abortMultipartUpload(key: string, uploadId: string): Promise<boolean>;

  /** Size and type of a stored object, or null when there is none. */
  abstract headObject(key: string): Promise<{ sizeBytes: number; contentType?: string } | null>;

  /** A time-limited GET link for the API's own tools (ffprobe, ffmpeg), at the address the API reaches storage. */
  abstract internalGetUrl(key: string, expiresInSeconds: number): Promise<string>;

  /** Resolves when the store answers (the health check). */
  abstract ping(): Promise<void>;
}
