import { HeadBucketCommand, S3Client } from '@aws-sdk/client-s3';
import { Inject, Injectable, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { AppConfig } from '../../config/app-config';

/** The only place that talks to S3; services ask it for objects and presigned URLs. */
@Injectable()
export class StorageService implements OnModuleDestroy {
  private readonly client: S3Client;
  readonly bucket: string;

  constructor(@Inject(ConfigService) config: ConfigService<AppConfig, true>) {
    const storage = config.get('storage', { infer: true });
    this.bucket = storage.bucket;
    this.client = new S3Client({
      endpoint: storage.endpoint,
      region: storage.region,
      forcePathStyle: storage.forcePathStyle,
      credentials: { accessKeyId: storage.accessKeyId, secretAccessKey: storage.secretAccessKey },
      // The SDK's default streaming checksums corrupt objects on the local S3 fake; real S3 accepts both.
      requestChecksumCalculation: 'WHEN_REQUIRED',
      responseChecksumValidation: 'WHEN_REQUIRED',
    });
  }

  async ping(): Promise<void> {
    await this.client.send(new HeadBucketCommand({ Bucket: this.bucket }));
  }

  onModuleDestroy(): void {
    this.client.destroy();
  }
}
