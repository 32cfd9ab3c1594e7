import { randomBytes } from 'node:crypto';
import { EnvironmentVariables, validateEnvironment } from './environment';
import { parseTrustProxy, type TrustProxySetting } from './trust-proxy';

export interface AppConfig {
  env: EnvironmentVariables['NODE_ENV'];
  port: number;
  host: string;
  appOrigin: string;
  studioDist?: string;
  footage: { maxBytes: number };
  /** Public calculators: requests a minute per client address, for all of them and for the text tools. */
  tools: { rateLimitPerMinute: number; textRateLimitPerMinute: number };
  auth: { adminEmails: string[]; rateLimitPerMinute: number; csrfSecret: string };
  /** Express's `trust proxy`: whom to believe about the client's address (X-Forwarded-For). */
  trustProxy: TrustProxySetting;
  database: { host: string; port: number; user: string; password: string; name: string };
  redis: { host: string; port: number; password?: string; prefix: string };
  storage: {
    driver: EnvironmentVariables['STORAGE_DRIVER'];
    endpoint?: string;
    publicEndpoint?: string;
    region: string;
    bucket: string;
    accessKeyId: string;
    secretAccessKey: string;
    forcePathStyle: boolean;
  };
  mail: {
    driver: EnvironmentVariables['MAIL_DRIVER'];
    host: string;
    port: number;
    secure: boolean;
    ignoreTls: boolean;
    user?: string;
    password?: string;
    from: string;
    /** The outbox relay: on in this process or not, SMTP connections, mails a minute across all processes. */
    relay: { enabled: boolean; concurrency: number; ratePerMinute: number };
  };
}

export function buildAppConfig(env: EnvironmentVariables): AppConfig {
  return {
    env: env.NODE_ENV,
    port: env.PORT,
    host: env.HOST,
    appOrigin: env.APP_ORIGIN.replace(/\/$/, ''),
    studioDist: env.STUDIO_DIST,
    footage: { maxBytes: env.FOOTAGE_MAX_BYTES },
    tools: { rateLimitPerMinute: env.TOOLS_RATE_LIMIT, textRateLimitPerMinute: env.TOOLS_TEXT_RATE_LIMIT },
    auth: {
      adminEmails: (env.ADMIN_EMAILS ?? '')
        .split(',')
        .map((email) => email.trim().toLowerCase())
        .filter((email) => email.length > 0),
      rateLimitPerMinute: env.AUTH_RATE_LIMIT,
      // Outside production an unset key is random per process: tokens then last as long as the process.
      csrfSecret: env.CSRF_SECRET ?? randomBytes(32).toString('base64url'),
    },
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    database: {
      host: env.DB_HOST,
      port: env.DB_PORT,
      user: env.DB_USER,
      password: env.DB_PASSWORD,
      name: env.DB_NAME,
    },
    redis: {
      host: env.REDIS_HOST,
      port: env.REDIS_PORT,
      password: env.REDIS_PASSWORD,
      prefix: env.QUEUE_PREFIX,
    },
    storage: {
      driver: env.STORAGE_DRIVER,
      endpoint: env.S3_ENDPOINT,
      publicEndpoint: env.S3_PUBLIC_ENDPOINT ?? env.S3_ENDPOINT,
      region: env.S3_REGION,
      bucket: env.S3_BUCKET,
      accessKeyId: env.S3_ACCESS_KEY_ID,
      secretAccessKey: env.S3_SECRET_ACCESS_KEY,
      forcePathStyle: env.S3_FORCE_PATH_STYLE,
    },
    mail: {
      driver: env.MAIL_DRIVER,
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      ignoreTls: env.SMTP_IGNORE_TLS,
      user: env.SMTP_USER,
      password: env.SMTP_PASSWORD,
      from: env.MAIL_FROM,
      relay: { enabled: env.MAIL_RELAY, concurrency: env.MAIL_CONCURRENCY, ratePerMinute: env.MAIL_RATE_PER_MINUTE },
    },
  };
}

/** Reads and validates process.env; used by the Nest config module and the CLI scripts alike. */
export function loadAppConfig(raw: Record<string, unknown> = process.env): AppConfig {
  return buildAppConfig(validateEnvironment(raw));
}
