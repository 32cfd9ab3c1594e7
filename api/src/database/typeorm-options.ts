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
    // A database that does not answer must not hold requests for long: give up connecting after 5 s (mysql2's
    // default is 10 s). The pool drops a connection that died and opens a fresh one for the next query, so
    // the API recovers from a restarted database by itself (npm run test:faults checks both).
    connectTimeout: 5_000,
  };
}
