import { Logger } from '@nestjs/common';
import Redis from 'ioredis';

/** The Redis connection a cache uses (the same server as the queues and rate limits). */
export interface CacheConnection {
  host: string;
  port: number;
  password?: string;
}

// Reads one field and the generation it belongs to, in one round trip.
const READ_FIELD = `
return { redis.call('HGET', KEYS[1], ARGV[1]), redis.call('GET', KEYS[2]) or '0' }
`;

// Stores a field only while the generation is still the one read before the value was computed: a value
// computed from rows read before an invalidation never outlives it.
const WRITE_FIELD_IF_CURRENT = `
if (redis.call('GET', KEYS[2]) or '0') ~= ARGV[3] then return 0 end
redis.call('HSET', KEYS[1], ARGV[1], ARGV[2])
redis.call('PEXPIRE', KEYS[1], ARGV[4])
return 1
`;

// Forgets every field and moves the generation on, atomically.
const INVALIDATE = `
redis.call('DEL', KEYS[1])
return redis.call('INCR', KEYS[2])
`;

/** A field's value (null on a miss) and the generation to hand back to `writeIfCurrent`; null when Redis is unreachable. */
export interface CachedField {
  value: string | null;
  generation: string | null;
}

/**
 * Small values (entity tags) held in Redis for every API process, all forgotten at once by `invalidate()`, plus
 * content-addressed blobs (answers keyed by their tag) that need no invalidation. Redis being unreachable is a
 * miss, never an error: callers then compute from the database as if nothing were cached.
 */
export class GenerationalCache {
  private readonly logger = new Logger(GenerationalCache.name);
  private readonly fieldsKey: string;
  private readonly generationKey: string;

  constructor(
    private readonly redis: Redis,
    private readonly namespace: string,
    private readonly ttlMs: number,
  ) {
    this.fieldsKey = `${namespace}:fields`;
    this.generationKey = `${namespace}:generation`;
  }

  static connect(connection: CacheConnection, namespace: string, ttlMs: number): GenerationalCache {
    // Fail fast rather than queue: a read that cannot reach Redis goes to the database instead.
    const redis = new Redis({ ...connection, maxRetriesPerRequest: 1, commandTimeout: 1000, lazyConnect: true });
    redis.on('error', () => undefined);
    return new GenerationalCache(redis, namespace, ttlMs);
  }

  async read(field: string): Promise<CachedField> {
    try {
      const [value, generation] = (await this.redis.eval(READ_FIELD, 2, this.fieldsKey, this.generationKey, field)) as [string | null, string];
      return { value, generation };
    } catch {
      return { value: null, generation: null };
    }
  }

  async writeIfCurrent(field: string, value: string, generation: string | null): Promise<void> {
    if (generation === null) return;
    await this.redis
      .eval(WRITE_FIELD_IF_CURRENT, 2, this.fieldsKey, this.generationKey, field, value, generation, String(this.ttlMs))
      .catch(() => undefined);
  }

  /** Forgets every field (on every process, since they all read Redis). */
  async invalidate(): Promise<void> {
    await this.redis.eval(INVALIDATE, 2, this.fieldsKey, this.generationKey).catch((error: unknown) => {
      // Fields expire after ttlMs, which bounds how long this can leave a stale value.
      this.logger.warn(`${this.namespace}: could not invalidate (${error instanceof Error ? error.message : String(error)})`);
    });
  }

  async getBlob(key: string): Promise<Buffer | null> {
    return this.redis.getBuffer(`${this.namespace}:blob:${key}`).catch(() => null);
  }

  async setBlob(key: string, value: Buffer): Promise<void> {
    await this.redis.set(`${this.namespace}:blob:${key}`, value, 'PX', this.ttlMs).catch(() => undefined);
  }

  async close(): Promise<void> {
    if (this.redis.status === 'wait' || this.redis.status === 'end') return;
    await this.redis.quit().catch(() => this.redis.disconnect());
  }
}
