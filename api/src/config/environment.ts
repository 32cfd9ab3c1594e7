import { plainToInstance, Transform } from 'class-transformer';
import {
  IsBoolean,
  IsEmail,
  IsIn,
  IsInt,
  IsNotEmpty,
  IsOptional,
  IsString,
  IsUrl,
  Max,
  Min,
  MinLength,
  ValidateBy,
  ValidateIf,
  validateSync,
  type ValidationArguments,
} from 'class-validator';
import { trustProxyProblem } from './trust-proxy';

/** Storage and mail drivers `InfraModule` can bind (infra/storage, infra/mail); a hosted provider's driver adds its name. */
export const STORAGE_DRIVERS = ['s3'] as const;
export const MAIL_DRIVERS = ['smtp'] as const;

const toBoolean = ({ value }: { value: unknown }) =>
  value === undefined ? undefined : value === true || value === 'true' || value === '1';

/**
 * Every setting the API reads from its environment. The start and test scripts
 * (scripts/env.sh) provide local values; production sets them explicitly.
 */
export class EnvironmentVariables {
  @IsIn(['development', 'test', 'production'])
  NODE_ENV: 'development' | 'test' | 'production' = 'development';

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  @Max(65535)
  PORT!: number;

  /** Address to listen on: loopback locally, 0.0.0.0 behind a load balancer. */
  @IsString()
  @IsNotEmpty()
  HOST: string = '127.0.0.1';

  @IsUrl({ require_tld: false })
  APP_ORIGIN!: string;

  @IsString()
  @IsNotEmpty()
  DB_HOST!: string;

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  @Max(65535)
  DB_PORT!: number;

  @IsString()
  @IsNotEmpty()
  DB_USER!: string;

  @IsString()
  DB_PASSWORD!: string;

  @IsString()
  @IsNotEmpty()
  DB_NAME!: string;

  @IsString()
  @IsNotEmpty()
  REDIS_HOST!: string;

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  @Max(65535)
  REDIS_PORT!: number;

  @IsOptional()
  @IsString()
  REDIS_PASSWORD?: string;

  @IsString()
  @IsNotEmpty()
  QUEUE_PREFIX: string = 'fitwright';

  /** Which storage driver keeps objects: `s3` speaks to any S3-compatible store (the local fake, AWS, others). */
  @IsIn(STORAGE_DRIVERS)
  STORAGE_DRIVER: (typeof STORAGE_DRIVERS)[number] = 's3';

  /** Empty means the provider's default endpoint (real AWS S3). */
  @IsOptional()
  @IsUrl({ require_tld: false })
  S3_ENDPOINT?: string;

  /** The storage address browsers use for presigned URLs, if it differs from S3_ENDPOINT. */
  @IsOptional()
  @IsUrl({ require_tld: false })
  S3_PUBLIC_ENDPOINT?: string;

  @IsString()
  @IsNotEmpty()
  S3_REGION!: string;

  @IsString()
  @IsNotEmpty()
  S3_BUCKET!: string;

  @IsString()
  @IsNotEmpty()
  S3_ACCESS_KEY_ID!: string;

  @IsString()
  @IsNotEmpty()
  S3_SECRET_ACCESS_KEY!: string;

  @Transform(toBoolean)
  @IsBoolean()
  S3_FORCE_PATH_STYLE: boolean = false;

  /** Which mail driver the outbox relay sends through: `smtp` (any SMTP server, the local fake included). */
  @IsIn(MAIL_DRIVERS)
  MAIL_DRIVER: (typeof MAIL_DRIVERS)[number] = 'smtp';

  @IsString()
  @IsNotEmpty()
  SMTP_HOST!: string;

  @Transform(({ value }) => Number(value))
  @IsInt()
  @Min(1)
  @Max(65535)
  SMTP_PORT!: number;

  @Transform(toBoolean)
  @IsBoolean()
  SMTP_SECURE: boolean = false;

  /** Only for the local SMTP fake, whose STARTTLS certificate is self-made. */
  @Transform(toBoolean)
  @IsBoolean()
  SMTP_IGNORE_TLS: boolean = false;

  @IsOptional()
  @IsString()
  SMTP_USER?: string;

  @IsOptional()
  @IsString()
  SMTP_PASSWORD?: string;

  @IsEmail({ allow_display_name: true })
  MAIL_FROM!: string;

  /** Whether this process relays the mail outbox (SMTP). Off on API processes when queue-only workers send. */
  @Transform(toBoolean)
  @IsBoolean()
  MAIL_RELAY: boolean = true;

  /** SMTP connections (and messages in flight) per relaying process. */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1)
  @Max(50)
  MAIL_CONCURRENCY: number = 5;

  /** Mails accepted by the SMTP relay per minute, counted across every process (the relay's contract). */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1)
  MAIL_RATE_PER_MINUTE: number = 6000;

  /** Comma-separated e-mail addresses whose accounts are site admins (optional; e.g. the first admin). */
  @IsOptional()
  @IsString()
  ADMIN_EMAILS?: string;

  /** Attempts per minute and client address on each sign-in, sign-up and password-reset form. */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1)
  AUTH_RATE_LIMIT: number = 10;

  /** Requests per minute and client address on all public calculators together (/api/tools/*). */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1)
  TOOLS_RATE_LIMIT: number = 300;

  /** Requests per minute and client address on the text tools (measurement extraction, transcript parsing). */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1)
  TOOLS_TEXT_RATE_LIMIT: number = 30;

  /**
   * Proxies allowed to name the client's address in X-Forwarded-For: a hop count, or a comma-separated list of
   * addresses, CIDR ranges and `loopback` / `linklocal` / `uniquelocal`. Empty (the default) trusts nobody, which
   * is right when the API listens directly; otherwise any client could pick its own address and dodge rate limits.
   */
  @IsOptional()
  @ValidateBy({
    name: 'isTrustProxy',
    validator: {
      validate: (value: unknown) => typeof value === 'string' && trustProxyProblem(value) === undefined,
      defaultMessage: (args?: ValidationArguments) =>
        `TRUST_PROXY ${typeof args?.value === 'string' ? (trustProxyProblem(args.value) ?? 'is invalid') : 'must be text'}`,
    },
  })
  TRUST_PROXY?: string;

  /**
   * Key for signing CSRF tokens to their session (HMAC-SHA256); at least 32 characters, the same on every API
   * process. Required in production; elsewhere a random key per process is used when it is not set.
   */
  @ValidateIf((env: EnvironmentVariables) => env.NODE_ENV === 'production' || env.CSRF_SECRET !== undefined)
  @IsString()
  @MinLength(32)
  CSRF_SECRET?: string;

  /** Largest footage file accepted for upload, in bytes (default 20 GB). At most 640 GiB: 10,000 parts of 64 MiB. */
  @Transform(({ value }) => (value === undefined ? undefined : Number(value)))
  @IsInt()
  @Min(1_000_000)
  @Max(10_000 * 64 * 1024 * 1024)
  FOOTAGE_MAX_BYTES: number = 20_000_000_000;

  /** Folder of the built studio; empty means the API serves no front end. */
  @IsOptional()
  @IsString()
  STUDIO_DIST?: string;
}

/** Validates the environment once at boot and fails with every problem listed. */
export function validateEnvironment(raw: Record<string, unknown>): EnvironmentVariables {
  const present = Object.fromEntries(Object.entries(raw).filter(([, value]) => value !== ''));
  const env = plainToInstance(EnvironmentVariables, present, { exposeDefaultValues: true });
  const errors = validateSync(env, { skipMissingProperties: false });
  if (errors.length > 0) {
    const lines = errors.map((error) => {
      const reasons = Object.values(error.constraints ?? {}).join('; ');
      return `  - ${error.property}: ${reasons} (got ${JSON.stringify(raw[error.property] ?? null)})`;
    });
    throw new Error(`Invalid configuration, fix these environment variables:\n${lines.join('\n')}`);
  }
  return env;
}
