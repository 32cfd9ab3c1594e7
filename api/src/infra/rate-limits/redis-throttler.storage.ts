import { OnModuleDestroy } from '@nestjs/common';
import type { ThrottlerStorage } from '@nestjs/throttler';
import { RedisScripts, type RedisConnection } from '../redis/redis-scripts';

type ThrottlerStorageRecord = Awaited<ReturnType<ThrottlerStorage['increment']>>;

/**
 * Counts hits in one Lua call so concurrent requests on any API process see the same count.
 * KEYS: hits, block. ARGV: ttl ms, limit, block ms. Returns hits, hits ttl ms, blocked (0/1), block ttl ms.
 */
const INCREMENT = `
local blockTtl = redis.call('PTTL', KEYS[2])
if blockTtl > 0 then
  return { tonumber(redis.call('GET', KEYS[1]) or ARGV[2]) + 1, redis.call('PTTL', KEYS[1]), 1, blockTtl }
end
local hits = redis.call('INCR', KEYS[1])
if hits == 1 then redis.call('PEXPIRE', KEYS[1], ARGV[1]) end
local hitsTtl = redis.call('PTTL', KEYS[1])
if hits > tonumber(ARGV[2]) then
  redis.call('SET', KEYS[2], '1', 'PX', ARGV[3])
  return { hits, hitsTtl, 1, tonumber(ARGV[3]) }
end
return { hits, hitsTtl, 0, 0 }
`;

/** Rate-limit counters in Redis, shared by every API process (the in-memory default is per process). */
export class RedisThrottlerStorage implements ThrottlerStorage, OnModuleDestroy {
  private readonly redis: RedisScripts;

  constructor(
    connection: RedisConnection,
    private readonly prefix: string,
  ) {
    this.redis = new RedisScripts(connection);
  }

  async increment(
    key: string,
    ttl: number,
    limit: number,
    blockDuration: number,
    throttlerName: string,
  ): Promise<ThrottlerStorageRecord> {
    const base = `${this.prefix}:throttle:${throttlerName}:${key}`;
    const [totalHits, hitsTtl, blocked, blockTtl] = (await this.redis.eval(INCREMENT, [base, `${base}:blocked`], [ttl, limit, blockDuration])) as [number, number, number, number];
    return {
      totalHits,
      timeToExpire: Math.max(0, Math.ceil(hitsTtl / 1000)),
      isBlocked: blocked === 1,
      timeToBlockExpire: Math.max(0, Math.ceil(blockTtl / 1000)),
    };
  }

  async onModuleDestroy(): Promise<void> {
    await this.redis.close();
  }
}
