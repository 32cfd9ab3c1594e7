import { loadAppConfig } from './app-config';

const complete = {
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
  S3_ENDPOINT: 'http://127.0.0.1:4579',
  S3_REGION: 'us-east-1',
  S3_BUCKET: 'media',
  S3_ACCESS_KEY_ID: 'S3RVER',
  S3_SECRET_ACCESS_KEY: 'S3RVER',
  S3_FORCE_PATH_STYLE: 'true',
  SMTP_HOST: '127.0.0.1',
  SMTP_PORT: '1035',
  MAIL_FROM: 'Fitwright <no-reply@fitwright.local>',
};

describe('loadAppConfig', () => {
  it('turns a complete environment into typed settings', () => {
    const config = loadAppConfig(complete);
    expect(config.port).toBe(3100);
    expect(config.database).toEqual({
      host: '127.0.0.1',
      port: 3317,
      user: 'fitwright',
      password: 'secret',
      name: 'fitwright_test',
    });
    expect(config.storage.forcePathStyle).toBe(true);
    expect(config.storage.publicEndpoint).toBe('http://127.0.0.1:4579');
    expect(config.mail.ignoreTls).toBe(false);
  });

  it('lists every missing or malformed variable at once', () => {
    const { DB_HOST: _dropped, ...withoutHost } = complete;
    expect(() => loadAppConfig({ ...withoutHost, SMTP_PORT: 'twenty-five' })).toThrow(
      /DB_HOST[\s\S]*SMTP_PORT/,
    );
  });

  it('treats an empty value as missing', () => {
    expect(() => loadAppConfig({ ...complete, S3_BUCKET: '' })).toThrow(/S3_BUCKET/);
  });
});
