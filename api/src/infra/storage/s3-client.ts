import { S3Client } from '@aws-sdk/client-s3';
import { AppConfig } from '../../config/app-config';

export type StorageSettings = AppConfig['storage'];

/** A dead or stopped store must fail a request in seconds, not hold it (and its caller) open. */
export const STORAGE_CONNECT_TIMEOUT_MS = 3_000;
export const STORAGE_REQUEST_TIMEOUT_MS = 30_000;

/**
 * The one way an S3 client is made, for the API, the backup tools and anything else that reaches
 * storage. `endpoint` overrides the configured one (browsers may reach storage at another address).
 */
export function createS3Client(storage: StorageSettings, options: { endpoint?: string; timeouts?: boolean } = {}): S3Client {
  return new S3Client({
    endpoint: options.endpoint ?? storage.endpoint,
    region: storage.region,
    forcePathStyle: storage.forcePathStyle,
    credentials: { accessKeyId: storage.accessKeyId, secretAccessKey: storage.secretAccessKey },
    // The SDK's default streaming checksums corrupt objects on the local S3 fake; real S3 accepts both.
    requestChecksumCalculation: 'WHEN_REQUIRED',
    responseChecksumValidation: 'WHEN_REQUIRED',
    ...(options.timeouts ? { requestHandler: { connectionTimeout: STORAGE_CONNECT_TIMEOUT_MS, requestTimeout: STORAGE_REQUEST_TIMEOUT_MS } } : {}),
  });
}
