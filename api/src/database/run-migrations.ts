import { Logger } from '@nestjs/common';
import { dataSource } from './data-source';

/** Applies pending migrations; run by `npm start` and `npm test` before the app starts. */
async function runMigrations(): Promise<void> {
  const logger = new Logger('Migrations');
  await dataSource.initialize();
  try {
    const applied = await dataSource.runMigrations({ transaction: 'each' });
    logger.log(applied.length ? `applied ${applied.map((m) => m.name).join(', ')}` : 'schema is up to date');
  } finally {
    await dataSource.destroy();
  }
}

runMigrations().catch((error: unknown) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
