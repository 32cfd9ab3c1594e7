import { createReadStream } from 'node:fs';
import { mkdir, readdir, readFile, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { BucketCopier, CopiedObject, hashFile, removePartial, StorageSettings } from '../../infra/backup/bucket-copy';
import { DatabaseInspector, DatabaseSettings, dumpDatabase } from '../../infra/backup/database-tools';
import { DumpSummaryReader } from './dump-summary';
import { BackupManifest, DUMP_FILE, MANIFEST_FILE, newManifest, OBJECTS_FOLDER } from './manifest';

export interface BackupTarget {
  database: DatabaseSettings;
  storage: StorageSettings;
}

export type ProgressLog = (line: string) => void;

/**
 * Writes a backup of the database and the bucket into `folder` (created; it must be empty):
 * a `--single-transaction` dump, every object by content hash, and the manifest, last.
 * The database is dumped first and the bucket copied after, so every object the dump refers to
 * is copied unless the app deletes it meanwhile (listed as `vanished`).
 */
export async function createBackup(target: BackupTarget, folder: string, log: ProgressLog = () => undefined): Promise<BackupManifest> {
  await mkdir(join(folder, OBJECTS_FOLDER), { recursive: true });
  const existing = (await readdir(folder)).filter((name) => name !== OBJECTS_FOLDER);
  if (existing.length > 0 || (await readdir(join(folder, OBJECTS_FOLDER))).length > 0) {
    throw new Error(`${folder} is not empty; give a new folder for each backup`);
  }

  const inspector = await DatabaseInspector.open(target.database);
  let migrationLevel: BackupManifest['database']['migrationLevel'];
  try {
    migrationLevel = await inspector.migrationLevel();
    log(`dumping database ${target.database.name} (${target.database.host}:${target.database.port})`);
    await dumpDatabase(target.database, join(folder, DUMP_FILE));
    const levelAfter = await inspector.migrationLevel();
    if (JSON.stringify(levelAfter) !== JSON.stringify(migrationLevel)) {
      throw new Error('the schema was migrated while the dump ran; run the backup again');
    }
  } finally {
    await inspector.close();
  }
  const dump = await hashFile(join(folder, DUMP_FILE));
  const tables = await summariseDump(join(folder, DUMP_FILE));
  log(`database: ${tables.length} tables, ${tables.reduce((sum, table) => sum + table.rows, 0)} rows, ${dump.bytes} bytes`);

  const copier = new BucketCopier(target.storage);
  const objects: CopiedObject[] = [];
  const vanished: string[] = [];
  try {
    log(`copying bucket ${target.storage.bucket}`);
    const listed: string[] = [];
    for await (const item of copier.list()) listed.push(item.key);
    for (const key of listed) {
      const copied = await copier.download(key, join(folder, OBJECTS_FOLDER));
      if (copied) objects.push(copied);
      else vanished.push(key);
    }
  } finally {
    await removePartial(join(folder, OBJECTS_FOLDER));
    copier.close();
  }
  objects.sort((a, b) => (a.key < b.key ? -1 : a.key > b.key ? 1 : 0));
  const totalBytes = objects.reduce((sum, object) => sum + object.bytes, 0);
  log(`storage: ${objects.length} objects, ${totalBytes} bytes${vanished.length ? `, ${vanished.length} deleted while copying` : ''}`);

  const manifest = newManifest({
    createdAt: new Date().toISOString(),
    app: await appVersion(),
    database: { name: target.database.name, file: DUMP_FILE, bytes: dump.bytes, sha256: dump.sha256, migrationLevel, tables },
    storage: { bucket: target.storage.bucket, objectCount: objects.length, totalBytes, objects, vanished },
  });
  await writeFile(join(folder, MANIFEST_FILE), `${JSON.stringify(manifest, null, 2)}\n`);
  return manifest;
}

async function summariseDump(file: string): Promise<{ name: string; rows: number }[]> {
  const reader = new DumpSummaryReader();
  const lines = createInterface({ input: createReadStream(file, 'utf8'), crlfDelay: Infinity });
  for await (const line of lines) reader.readLine(line);
  return [...reader.summary().rowsByTable]
    .map(([name, rows]) => ({ name, rows }))
    .sort((a, b) => (a.name < b.name ? -1 : a.name > b.name ? 1 : 0));
}

/** The API package's name and version (api/package.json; the same path from src/ and dist/). */
async function appVersion(): Promise<{ name: string; version: string }> {
  const packageJson = JSON.parse(await readFile(join(__dirname, '..', '..', '..', 'package.json'), 'utf8')) as { name: string; version: string };
  return { name: packageJson.name, version: packageJson.version };
}
