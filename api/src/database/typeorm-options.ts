import { DataSourceOptions } from 'typeorm';
import { AppConfig } from '../config/app-config';
import { migrations } from './migrations';

/** One description of the connection, shared by the Nest app and the migration CLI. */
export function typeormOptions(database: AppConfig['database']): DataSourceOptions {
  return {
    type: 'mysql',
    host: database.host,
    port: database.port,
    username: database.user,
    password: database.password,
    database: database.name,
    charset: 'utf8mb4_unicode_ci',
    timezone: 'Z',
    // The schema changes through migrations only.
    synchronize: false,
    migrationsRun: false,
    migrations,
    entities: [`${__dirname}/../**/*.entity.{ts,js}`],
    bigNumberStrings: true,
    supportBigNumbers: true,
  };
}
