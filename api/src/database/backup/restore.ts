import { join } from 'node:path';
import { BucketCopier, hashFile } from '../../infra/backup/bucket-copy';
import { DatabaseInspector, loadDump } from '../../infra/backup/database-tools';
import { migrations } from '../migrations';
import { BackupTarget, ProgressLog } from './backup';
import { BackupManifest, OBJECTS_FOLDER, readManifest } from './manifest';

export interface RestoreOptions {
  /** Replace whatever the target database and bucket hold (otherwise a non-empty target is refused). */
  force?: boolean;
}

/**
 * Brings a backup back into an empty database and bucket. Every file is checked against the
 * manifest's SHA-256 and size before anything is written; after loading, each table's row count
 * must equal the manifest's. Newer migrations than the backup's are left to the usual migration run.
 */
export async function restoreBackup(
  target: BackupTarget,
  folder: string,
  options: RestoreOptions = {},
  log: ProgressLog = () => undefined,
): Promise<BackupManifest> {
  const manifest = await readManifest(folder);
  await verifyFiles(manifest, folder, log);
  checkMigrationLevel(manifest, options);

  const inspector = await DatabaseInspector.open(target.database);
  const copier = new BucketCopier(target.storage);
  try {
    const tables = await inspector.tables();
    const bucketExists = await copier.exists();
    const bucketEmpty = !bucketExists || (await copier.isEmpty());
    if (!options.force && (tables.length > 0 || !bucketEmpty)) {
      const held = [
        tables.length > 0 ? `database ${target.database.name} has ${tables.length} tables` : '',
        bucketEmpty ? '' : `bucket ${target.storage.bucket} holds objects`,
      ].filter(Boolean);
      throw new Error(`refusing to restore over existing data (${held.join('; ')}); restore into an empty instance or pass --force to replace it`);
    }
    if (tables.length > 0) {
      log(`--force: dropping ${tables.length} tables of ${target.database.name}`);
      await inspector.dropEverything();
    }
    if (!bucketExists) await copier.create();
    else if (!bucketEmpty) log(`--force: deleted ${await copier.deleteAll()} objects from ${target.storage.bucket}`);

    log(`loading ${manifest.database.file} into ${target.database.name}`);
    await loadDump(target.database, join(folder, manifest.database.file));
    for (const table of manifest.database.tables) {
      const rows = await inspector.rowCount(table.name);
      if (rows !== table.rows) throw new Error(`table ${table.name} holds ${rows} rows after loading, the manifest says ${table.rows}`);
    }
    log(`database: ${manifest.database.tables.length} tables, row counts match the manifest`);

    for (const object of manifest.storage.objects) await copier.upload(object, join(folder, OBJECTS_FOLDER));
    log(`storage: ${manifest.storage.objects.length} objects restored to ${target.storage.bucket}`);
  } finally {
    copier.close();
    await inspector.close();
  }
  return manifest;
}

/** Checks the dump and every object file before anything is written, naming the first one that differs. */
async function verifyFiles(manifest: BackupManifest, folder: string, log: ProgressLog): Promise<void> {
  const expectations = [
    { path: manifest.database.file, what: 'the database dump', bytes: manifest.database.bytes, sha256: manifest.database.sha256 },
    ...manifest.storage.objects.map((object) => ({
      path: join(OBJECTS_FOLDER, object.sha256),
      what: `object ${object.key}`,
      bytes: object.bytes,
      sha256: object.sha256,
    })),
  ];
  const checked = new Set<string>();
  for (const expected of expectations) {
    if (checked.has(expected.path)) continue;
    let actual: { bytes: number; sha256: string };
    try {
      actual = await hashFile(join(folder, expected.path));
    } catch {
      throw new Error(`${expected.path} (${expected.what}) is missing from the backup`);
    }
    if (actual.bytes !== expected.bytes || actual.sha256 !== expected.sha256) {
      throw new Error(
        `${expected.path} (${expected.what}) does not match the manifest: ${actual.bytes} bytes, SHA-256 ${actual.sha256}; expected ${expected.bytes} bytes, ${expected.sha256}`,
      );
    }
    checked.add(expected.path);
  }
  log(`checked ${checked.size} files against the manifest's SHA-256`);
}

/** A backup taken by newer code than this one has tables this code does not know. */
function checkMigrationLevel(manifest: BackupManifest, options: RestoreOptions): void {
  const level = manifest.database.migrationLevel;
  if (!level || options.force) return;
  const known = migrations.map((migration) => (typeof migration === 'function' ? migration.name : String(migration)));
  if (!known.includes(level.name)) {
    throw new Error(`the backup's schema is at migration ${level.name}, which this version of the app does not know; restore with the version that wrote it (${manifest.app.version}) or pass --force`);
  }
}
