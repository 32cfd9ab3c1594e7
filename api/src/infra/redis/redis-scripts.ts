import Redis from 'ioredis';

export interface RedisConnection {
  host: string;
  port: number;
  password?: string;
}

/**
 * A Redis connection for counters shared by every API process (rate limits, sign-in pauses): it runs Lua
 * scripts, so each count is one atomic step, and deletes keys. It connects on first use and gives up a
 * command after two retries, so a Redis outage fails a request rather than holding it.
 */
export class RedisScripts {
  private readonly redis: Redis;

  constructor(connection: RedisConnection) {
    this.redis = new Redis({ ...connection, maxRetriesPerRequest: 2, lazyConnect: true });
  }

  eval(script: string, keys: string[], args: Array<string | number>): Promise<unknown> {
    return this.redis.eval(script, keys.length, ...keys, ...args);
  }

  async del(...keys: string[]): Promise<void> {
    await this.redis.del(...keys);
  }

  async close(): Promise<void> {
    // A connection never opened (lazyConnect) has nothing to close; an open one finishes its replies first.
    if (this.redis.status === 'wait' || this.redis.status === 'end') return;
    await this.redis.quit().catch(() => this.redis.disconnect());
  }
}
