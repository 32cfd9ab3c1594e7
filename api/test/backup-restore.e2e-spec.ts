import { spawnSync } from 'node:child_process';
import { appendFile, mkdtemp, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { DataSource } from 'typeorm';
import { loadAppConfig } from '../src/config/app-config';
import { BackupTarget, createBackup } from '../src/database/backup/backup';
import { BackupManifest, OBJECTS_FOLDER } from '../src/database/backup/manifest';
import { restoreBackup } from '../src/database/backup/restore';
import { loadDemoAccounts } from '../src/database/demo/demo-accounts';
import { loadDemoFitData } from '../src/database/demo/demo-fit-data';
import { loadDemoFootage } from '../src/database/demo/demo-footage';
import { loadDemoFollower, loadDemoGuide } from '../src/database/demo/demo-guide';
import { loadDemoMarks } from '../src/database/demo/demo-marks';
import { BucketCopier } from '../src/infra/backup/bucket-copy';
import { DatabaseInspector } from '../src/infra/backup/database-tools';
import { createTestApp } from './create-test-app';

// The demo clip may have to be generated first (about 15 s); later runs reuse it from .data/.
jest.setTimeout(300_000);

/** Runs SQL as MariaDB's root over the test server's socket (the app's user may not create databases). */
function asRoot(sql: string): void {
  const socket = join(String(process.env.FW_RUN), 'mysqld.sock');
  const result = spawnSync('mariadb', ['--no-defaults', `--socket=${socket}`, '-uroot', '-e', sql], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`mariadb as root failed: ${result.stderr}`);
}

async function describeDatabase(inspector: DatabaseInspector): Promise<{ name: string; rows: number; checksum: string }[]> {
  const tables = await inspector.tables();
  return Promise.all(
    tables.map(async (table) => ({ name: table.name, rows: await inspector.rowCount(table.name), checksum: await inspector.checksum(table.name) })),
  );
}

async function describeBucket(copier: BucketCopier): Promise<{ key: string; bytes: number; sha256: string }[]> {
  const objects: { key: string; bytes: number; sha256: string }[] = [];
  for await (const item of copier.list()) objects.push({ key: item.key, ...(await copier.hashObject(item.key)) });
  return objects.sort((a, b) => (a.key < b.key ? -1 : 1));
}

describe('backup and restore (real MariaDB and S3 fake)', () => {
  const config = loadAppConfig();
  const source: BackupTarget = { database: config.database, storage: config.storage };
  // A second database and bucket on the same test servers; never the dev profile's.
  const target: BackupTarget = {
    database: { ...config.database, name: `${config.database.name}_restore` },
    storage: { ...config.storage, bucket: `${config.storage.bucket}-restore-test` },
  };
  let folder: string;
  let manifest: BackupManifest;

  const freshTargetDatabase = () =>
    asRoot(
      `DROP DATABASE IF EXISTS \`${target.database.name}\`; CREATE DATABASE \`${target.database.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;` +
        ` GRANT ALL PRIVILEGES ON \`${target.database.name}\`.* TO '${config.database.user}'@'127.0.0.1';` +
        ` GRANT ALL PRIVILEGES ON \`${target.database.name}\`.* TO '${config.database.user}'@'localhost';`,
    );

  beforeAll(async () => {
    if (process.env.FW_PROFILE !== 'test') throw new Error('run on the test profile (scripts/with-test-services.sh or npm test)');
    const app = await createTestApp();
    try {
      const accounts = await loadDemoAccounts(app.get(DataSource));
      const ids = { workshopId: accounts.workshopId, creatorId: accounts.ownerId };
      await loadDemoFitData(app, ids);
      await loadDemoFootage(app, ids);
      await loadDemoMarks(app, ids);
      await loadDemoGuide(app, ids);
      await loadDemoFollower(app, { workshopId: accounts.workshopId, followerId: accounts.followerId });
    } finally {
      // Closing waits for the app's running jobs, so nothing writes while the copies are compared.
      await app.close();
    }
    freshTargetDatabase();
    const targetBucket = new BucketCopier(target.storage);
    try {
      if (await targetBucket.exists()) await targetBucket.deleteAll();
    } finally {
      targetBucket.close();
    }
    folder = await mkdtemp(join(tmpdir(), 'fitwright-backup-'));
    manifest = await createBackup(source, folder);
  });
  afterAll(async () => {
    if (folder) await rm(folder, { recursive: true, force: true });
    asRoot(`DROP DATABASE IF EXISTS \`${target.database.name}\``);
  });

  it('writes a manifest with the demo in it: row counts, objects with SHA-256, migration level, app version', () => {
    const rows = new Map(manifest.database.tables.map((table) => [table.name, table.rows]));
    expect(rows.get('users')).toBeGreaterThanOrEqual(3);
    expect(rows.get('footage')).toBeGreaterThanOrEqual(1);
    expect(rows.get('migrations')).toBe(manifest.database.migrationLevel?.applied);
    expect(manifest.database.migrationLevel?.name).toMatch(/\d{13}$/);
    expect(manifest.app).toEqual({ name: '@fitwright/api', version: expect.stringMatching(/^\d+\.\d+\.\d+/) });
    expect(manifest.storage.objects.length).toBeGreaterThan(0);
    expect(manifest.storage.objects.every((object) => /^[0-9a-f]{64}$/.test(object.sha256))).toBe(true);
  });

  it('restores into a fresh database and bucket: same tables, row counts, table checksums and objects', async () => {
    await restoreBackup(target, folder);

    const sourceDb = await DatabaseInspector.open(source.database);
    const targetDb = await DatabaseInspector.open(target.database);
    try {
      const original = await describeDatabase(sourceDb);
      const restored = await describeDatabase(targetDb);
      expect(restored.map((table) => table.name)).toEqual(original.map((table) => table.name));
      expect(restored).toEqual(original);
      expect(original.find((table) => table.name === 'users')?.rows).toBeGreaterThan(0);
    } finally {
      await sourceDb.close();
      await targetDb.close();
    }

    const sourceBucket = new BucketCopier(source.storage);
    const targetBucket = new BucketCopier(target.storage);
    try {
      const original = await describeBucket(sourceBucket);
      expect(original.length).toBeGreaterThan(0);
      expect(await describeBucket(targetBucket)).toEqual(original);
    } finally {
      sourceBucket.close();
      targetBucket.close();
    }
  });

  it('refuses to restore over a database or bucket that holds data', async () => {
    await expect(restoreBackup(target, folder)).rejects.toThrow(/refusing to restore over existing data .*--force/);
  });

  it('--force replaces what the target holds: a stray object and a stray table are gone afterwards', async () => {
    const targetBucket = new BucketCopier(target.storage);
    const targetDb = await DatabaseInspector.open(target.database);
    try {
      const sample = manifest.storage.objects[0];
      await targetBucket.upload({ ...sample, key: 'stray/not-in-the-backup' }, join(folder, OBJECTS_FOLDER));
      asRoot(`CREATE TABLE \`${target.database.name}\`.stray_table (id INT PRIMARY KEY)`);

      await restoreBackup(target, folder, { force: true });

      const keys: string[] = [];
      for await (const item of targetBucket.list()) keys.push(item.key);
      expect(keys).not.toContain('stray/not-in-the-backup');
      expect(keys.sort()).toEqual(manifest.storage.objects.map((object) => object.key).sort());
      expect((await targetDb.tables()).map((table) => table.name).sort()).toEqual(manifest.database.tables.map((table) => table.name).sort());
    } finally {
      targetBucket.close();
      await targetDb.close();
    }
  });

  it('checks every file before writing anything: a changed object stops the restore and names its key', async () => {
    freshTargetDatabase();
    const targetBucket = new BucketCopier(target.storage);
    try {
      await targetBucket.deleteAll();
      const victim = manifest.storage.objects[0];
      await appendFile(join(folder, OBJECTS_FOLDER, victim.sha256), 'x');
      await expect(restoreBackup(target, folder)).rejects.toThrow(`object ${victim.key}`);
      expect(await targetBucket.isEmpty()).toBe(true);
    } finally {
      targetBucket.close();
    }
    const targetDb = await DatabaseInspector.open(target.database);
    try {
      expect(await targetDb.tables()).toEqual([]);
    } finally {
      await targetDb.close();
    }
  });
});
