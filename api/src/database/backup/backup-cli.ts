import { join, resolve } from 'node:path';
import { loadAppConfig } from '../../config/app-config';
import { createBackup } from './backup';

/**
 * `npm run backup [-- FOLDER]` (scripts/backup.sh) runs this with a profile's environment; in production
 * run `node dist/database/backup/backup-cli.js FOLDER` with the app's environment.
 * Without FOLDER it writes to $FW_DATA/backups/YYYY-MM-DDTHHMMSS (UTC).
 */
export function defaultBackupFolder(dataFolder: string | undefined, now: Date): string {
  if (!dataFolder) throw new Error('give the backup folder (FW_DATA is not set, so there is no default)');
  const stamp = now.toISOString().slice(0, 19).replace(/:/g, '');
  return join(dataFolder, 'backups', stamp);
}

async function main(args: string[]): Promise<void> {
  if (args.length > 1 || args.some((arg) => arg.startsWith('-'))) throw new Error('usage: backup [FOLDER]');
  const folder = resolve(args[0] ?? defaultBackupFolder(process.env.FW_DATA, new Date()));
  const config = loadAppConfig();
  const manifest = await createBackup({ database: config.database, storage: config.storage }, folder, (line) => console.log(`[backup] ${line}`));
  console.log(`[backup] written to ${folder} (migration ${manifest.database.migrationLevel?.name ?? 'none'}, app ${manifest.app.version})`);
}

if (require.main === module) {
  main(process.argv.slice(2)).catch((error: unknown) => {
    console.error(`[backup] failed: ${error instanceof Error ? error.message : String(error)}`);
    process.exit(1);
  });
}
