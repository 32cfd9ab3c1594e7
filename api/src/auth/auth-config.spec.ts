import { loadAppConfig } from '../config/app-config';

const environment = {
  NODE_ENV: 'test',
  PORT: '3100',
  APP_ORIGIN: 'http://localhost:3100',
  DB_HOST: '127.0.0.1',
  DB_PORT: '3317',
  DB_USER: 'fitwright',
  DB_PASSWORD: 'secret',
  DB_NAME: 'fitwright_test',
  REDIS_HOST: '127.0.0.1',
  REDIS_PORT: '6390',
  S3_REGION: 'us-east-1',
  S3_BUCKET: 'media',
  S3_ACCESS_KEY_ID: 'S3RVER',
  S3_SECRET_ACCESS_KEY: 'S3RVER',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '1035',
  MAIL_FROM: 'Fitwright <no-reply@fitwright.local>',
};

describe('account settings from the environment', () => {
  it('has no admins and 10 attempts a minute unless told otherwise', () => {
    expect(loadAppConfig(environment).auth).toMatchObject({ adminEmails: [], rateLimitPerMinute: 10 });
    expect(loadAppConfig({ ...environment, ADMIN_EMAILS: '' }).auth.adminEmails).toEqual([]);
  });

  it('reads ADMIN_EMAILS as a trimmed, lower-cased list', () => {
    const config = loadAppConfig({ ...environment, ADMIN_EMAILS: ' Morgan@Fitwright.example ,,second@site.example ' });
    expect(config.auth.adminEmails).toEqual(['morgan@fitwright.example', 'second@site.example']);
  });

  it('refuses a rate limit that is not a positive whole number', () => {
    expect(loadAppConfig({ ...environment, AUTH_RATE_LIMIT: '3' }).auth.rateLimitPerMinute).toBe(3);
    expect(() => loadAppConfig({ ...environment, AUTH_RATE_LIMIT: 'lots' })).toThrow(/AUTH_RATE_LIMIT/);
    expect(() => loadAppConfig({ ...environment, AUTH_RATE_LIMIT: '0' })).toThrow(/AUTH_RATE_LIMIT/);
  });

  it('trusts no proxy unless TRUST_PROXY names some, and refuses a value it cannot use', () => {
    expect(loadAppConfig(environment).trustProxy).toBe(false);
    expect(loadAppConfig({ ...environment, TRUST_PROXY: 'loopback, 10.0.0.0/8' }).trustProxy).toEqual(['loopback', '10.0.0.0/8']);
    expect(loadAppConfig({ ...environment, TRUST_PROXY: '1' }).trustProxy).toBe(1);
    expect(() => loadAppConfig({ ...environment, TRUST_PROXY: 'true' })).toThrow(/TRUST_PROXY.*any client choose its own address/);
    expect(() => loadAppConfig({ ...environment, TRUST_PROXY: '10.0.0.0/40' })).toThrow(/TRUST_PROXY "10\.0\.0\.0\/40"/);
  });

  it('needs a CSRF key of 32 characters or more in production, and makes one per process elsewhere', () => {
    const production = { ...environment, NODE_ENV: 'production' };
    expect(() => loadAppConfig(production)).toThrow(/CSRF_SECRET/);
    expect(() => loadAppConfig({ ...production, CSRF_SECRET: 'too short' })).toThrow(/CSRF_SECRET/);
    const key = 'k'.repeat(32);
    expect(loadAppConfig({ ...production, CSRF_SECRET: key }).auth.csrfSecret).toBe(key);
    const first = loadAppConfig(environment).auth.csrfSecret;
    expect(first.length).toBeGreaterThanOrEqual(32);
    expect(loadAppConfig(environment).auth.csrfSecret).not.toBe(first);
  });
});
