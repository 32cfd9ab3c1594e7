import { OnModuleDestroy } from '@nestjs/common';
import { createHash } from 'node:crypto';
import { RedisScripts, type RedisConnection } from '../infra/redis/redis-scripts';
import { pauseSchedule, SIGN_IN_LOCKOUT, type SignInLockoutPolicy } from './sign-in-lockout';

/**
 * Takes one sign-in attempt for an account in a single Lua call, so parallel tries on any API process count:
 * while the account is paused, answers the pause left; otherwise counts the attempt as a failure in advance
 * (a success clears it) and starts the pause the schedule gives for that count.
 * KEYS: failures, pause. ARGV: window ms, then the pause for the 1st, 2nd, … failure (the last one repeats).
 * Returns the pause left in ms (0 when the attempt may go ahead).
 */
const TAKE_ATTEMPT = `
local paused = redis.call('PTTL', KEYS[2])
if paused > 0 then return paused end
local failures = redis.call('INCR', KEYS[1])
redis.call('PEXPIRE', KEYS[1], ARGV[1])
local pause = tonumber(ARGV[math.min(failures, #ARGV - 1) + 1])
if pause > 0 then redis.call('SET', KEYS[2], '1', 'PX', pause) end
return 0
`;

/** Failed sign-ins per account, in Redis (shared by every API process). Keys carry a hash, never the address. */
export class SignInAttemptsStore implements OnModuleDestroy {
  private readonly redis: RedisScripts;
  private readonly schedule: string[];
  private readonly window: string;

  constructor(
    connection: RedisConnection,
    private readonly prefix: string,
    policy: SignInLockoutPolicy = SIGN_IN_LOCKOUT,
  ) {
    this.redis = new RedisScripts(connection);
    this.schedule = pauseSchedule(policy).map(String);
    this.window = String(policy.windowMs);
  }

  /** The Redis keys of one account's counter and pause (exported for tests that move time forward). */
  keysFor(normalizedEmail: string): { failures: string; pause: string } {
    const base = `${this.prefix}:sign-in:${createHash('sha256').update(normalizedEmail, 'utf8').digest('hex')}`;
    return { failures: base, pause: `${base}:paused` };
  }

  /** Counts an attempt on the account; resolves to the pause left in ms (0: go ahead and check the password). */
  async take(normalizedEmail: string): Promise<number> {
    const keys = this.keysFor(normalizedEmail);
    const pausedMs = await this.redis.eval(TAKE_ATTEMPT, [keys.failures, keys.pause], [this.window, ...this.schedule]);
    return Number(pausedMs);
  }

  /** The right password was given: forget the account's failures and any pause. */
  async clear(normalizedEmail: string): Promise<void> {
    const keys = this.keysFor(normalizedEmail);
    await this.redis.del(keys.failures, keys.pause);
  }

  async onModuleDestroy(): Promise<void> {
    await this.redis.close();
  }
}
