import { Inject, Injectable, OnApplicationBootstrap, OnModuleDestroy } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectDataSource } from '@nestjs/typeorm';
import { gzip } from 'node:zlib';
import { promisify } from 'node:util';
import type {
  DataSource,
  EntityMetadata,
  EntitySubscriberInterface,
  InsertEvent,
  QueryRunner,
  RemoveEvent,
  SoftRemoveEvent,
  RecoverEvent,
  TransactionCommitEvent,
  TransactionRollbackEvent,
  UpdateEvent,
} from 'typeorm';
import type { AppConfig } from '../config/app-config';
import { carriesPresignedUrl } from '../common/interceptors/no-store.interceptor';
import { GenerationalCache } from '../infra/cache/generational-cache';
import { PUBLISHED_GUIDE_INPUT_TABLES } from './published-guide-versions';

const gzipAsync = promisify(gzip);

export const PUBLISHED_GUIDE_STORE = Symbol('PUBLISHED_GUIDE_STORE');
/** Bounds memory, and how long a change written past TypeORM's events (raw SQL) could leave a stale tag. */
const CACHE_TTL_MS = 10 * 60 * 1000;
const TOUCHED = 'publishedGuideInputsTouched';

export const publishedGuideStoreProvider = {
  provide: PUBLISHED_GUIDE_STORE,
  inject: [ConfigService],
  useFactory: (config: ConfigService<AppConfig, true>) => {
    const redis = config.get('redis', { infer: true });
    return GenerationalCache.connect({ host: redis.host, port: redis.port, password: redis.password }, `${redis.prefix}:public-guides`, CACHE_TTL_MS);
  },
};

/** A follow-along answer as stored: gzipped JSON, or the object itself when it must not be shared. */
export type CachedAnswer = { gzippedJson: Buffer } | { personal: object };

/**
 * Public guide reads for every API process, from Redis: each guide's entity tag (so a 304 costs one Redis call)
 * and each follow-along answer, gzipped, keyed by its tag (so a full read costs two). Tags are forgotten, on
 * every process at once, when any row the tag SQL reads is written and committed (a TypeORM subscriber below);
 * answers never need forgetting, since a new state has a new tag.
 */
@Injectable()
export class PublishedGuideCache implements EntitySubscriberInterface, OnApplicationBootstrap, OnModuleDestroy {
  constructor(
    @Inject(PUBLISHED_GUIDE_STORE) private readonly store: GenerationalCache,
    @InjectDataSource() dataSource: DataSource,
  ) {
    dataSource.subscribers.push(this);
  }

  /** The tag held for `field`, or the one `compute` reads from the database (then held until the next write). */
  async tag<Tag extends string | null>(field: string, compute: () => Promise<Tag>): Promise<Tag> {
    const held = await this.store.read(field);
    if (held.value !== null) return held.value as Tag;
    const tag = await compute();
    // Unpublished answers are not held: any slug can be asked for, and a 404 is not cached anyway.
    if (tag !== null) await this.store.writeIfCurrent(field, tag, held.generation);
    return tag;
  }

  /** The answer stored under `tag`, or the one `build` makes (stored unless it carries a presigned, private link). */
  async answer(tag: string, build: () => Promise<object>): Promise<CachedAnswer> {
    const stored = await this.store.getBlob(tag);
    if (stored) return { gzippedJson: stored };
    const answer = await build();
    const json = JSON.stringify(answer);
    if (carriesPresignedUrl(json)) return { personal: answer };
    const gzippedJson = await gzipAsync(json);
    await this.store.setBlob(tag, gzippedJson);
    return { gzippedJson };
  }

  /**
   * A page's server-rendered shell for the state `tag` names, as JSON text (built once per state, like the answer
   * it is made from; a new state has a new tag, so shells never need forgetting either).
   */
  async page(tag: string, build: () => Promise<object>): Promise<object> {
    const stored = await this.store.getBlob(`page:${tag}`);
    if (stored) return JSON.parse(stored.toString('utf8')) as object;
    const page = await build();
    await this.store.setBlob(`page:${tag}`, Buffer.from(JSON.stringify(page), 'utf8'));
    return page;
  }

  afterInsert(event: InsertEvent<unknown>) {
    return this.touched(event.metadata, event.queryRunner);
  }

  afterUpdate(event: UpdateEvent<unknown>) {
    return this.touched(event.metadata, event.queryRunner);
  }

  afterRemove(event: RemoveEvent<unknown>) {
    return this.touched(event.metadata, event.queryRunner);
  }

  afterSoftRemove(event: SoftRemoveEvent<unknown>) {
    return this.touched(event.metadata, event.queryRunner);
  }

  afterRecover(event: RecoverEvent<unknown>) {
    return this.touched(event.metadata, event.queryRunner);
  }

  // Forgotten after the outermost commit, never before: a tag read between an earlier forgetting and the
  // commit would be the old state, held as current. Awaited, so the request that wrote answers after it.
  async afterTransactionCommit(event: TransactionCommitEvent): Promise<void> {
    if (event.queryRunner.isTransactionActive || !event.queryRunner.data[TOUCHED]) return;
    delete event.queryRunner.data[TOUCHED];
    await this.store.invalidate();
  }

  afterTransactionRollback(event: TransactionRollbackEvent): void {
    if (!event.queryRunner.isTransactionActive) delete event.queryRunner.data[TOUCHED];
  }

  // Tags held in Redis may describe another database (a restore, a fresh test database): start from none.
  async onApplicationBootstrap(): Promise<void> {
    await this.store.invalidate();
  }

  async onModuleDestroy(): Promise<void> {
    await this.store.close();
  }

  private async touched(metadata: EntityMetadata, queryRunner: QueryRunner): Promise<void> {
    if (!PUBLISHED_GUIDE_INPUT_TABLES.has(metadata.tableName)) return;
    // Inside a transaction, wait for its commit; a statement of its own has committed already.
    if (queryRunner.isTransactionActive) queryRunner.data[TOUCHED] = true;
    else await this.store.invalidate();
  }
}
