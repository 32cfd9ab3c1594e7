import 'reflect-metadata';
import { DataSource } from 'typeorm';
import { loadAppConfig } from '../config/app-config';
import { typeormOptions } from './typeorm-options';

/** The DataSource the TypeORM CLI and the migration script use (reads the same environment as the app). */
export const dataSource = new DataSource(typeormOptions(loadAppConfig().database));
export default dataSource;
