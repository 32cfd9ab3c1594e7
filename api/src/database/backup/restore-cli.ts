import { resolve } from 'node:path';
import { loadAppConfig } from '../../config/app-config';
import { restoreBackup } from './restore';

/**
 * `npm run restore -- FOLDER [--force]` (scripts/restore.sh, which migrates afterwards); in production
 * `node dist/database/backup/restore-cli.js FOLDER` with the app's environment, then the migrations.
 */
export function parseRestoreArguments(args: string[]): { folder: string; force: boolean } {
  const force = args.includes('--force');
  const rest = args.filter((arg) => arg !== '--force');
  const unknown = rest.find((arg) => arg.startsWith('-'));
  if (unknown) throw new Error(`unknown option ${unknown}; usage: restore FOLDER [--force]`);
  if (rest.length !== 1) throw new Error('usage: restore FOLDER [--force] (the folder a backup wrote, holding manifest.json)');
  return { folder: rest[0], force };
}

async function main(args: string[]): Promise<void> {
  const { folder, force } = parseRestoreArguments(args);
  const config = loadAppConfig();
  const manifest = await restoreBackup({ database: config.database, storage: config.storage }, resolve(folder), { force }, (line) =>
    console.log(`[restore] ${line}`),
  );
  console.log(`[restore] restored the backup of ${manifest.createdAt} into ${config.database.name} and ${config.storage.bucket}`);
}

if (require.main === module) {
  main(process.argv.slice(2)).catch((error: unknown) => {
    console.error(`[restore] failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  });
}
