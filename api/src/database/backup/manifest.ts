import { readFile } from 'node:fs/promises';
import { join } from 'node:path';
import { CopiedObject } from '../../infra/backup/bucket-copy';

export const MANIFEST_FILE = 'manifest.json';
export const DUMP_FILE = 'database.sql';
export const OBJECTS_FOLDER = 'objects';
const FORMAT = 'fitwright-backup/1';

/** What a backup folder holds; written last, so a folder without it is an unfinished backup. */
export interface BackupManifest {
  format: typeof FORMAT;
  createdAt: string;
  app: { name: string; version: string };
  database: {
    name: string;
    file: string;
    bytes: number;
    sha256: string;
    /** The newest applied migration when the dump was taken. */
    migrationLevel: { name: string; timestamp: number; applied: number } | null;
    /** Rows per table as the dump holds them, sorted by table name. */
    tables: { name: string; rows: number }[];
  };
  storage: {
    bucket: string;
    objectCount: number;
    totalBytes: number;
    /** Sorted by key; each file is `objects/<sha256>`. */
    objects: CopiedObject[];
    /** Keys listed but deleted before they could be read (the app kept running). */
    vanished: string[];
  };
}

export function newManifest(fields: Omit<BackupManifest, 'format'>): BackupManifest {
  return { format: FORMAT, ...fields };
}

/** Reads and checks the shape of `folder/manifest.json`, naming the field that is wrong. */
export async function readManifest(folder: string): Promise<BackupManifest> {
  let text: string;
  try {
    text = await readFile(join(folder, MANIFEST_FILE), 'utf8');
  } catch {
    throw new Error(`${folder} is not a finished backup: ${MANIFEST_FILE} is missing`);
  }
  const parsed: unknown = JSON.parse(text);
  const manifest = parsed as BackupManifest;
  const problem = manifestProblem(parsed);
  if (problem) throw new Error(`${join(folder, MANIFEST_FILE)}: ${problem}`);
  return manifest;
}

const SHA256 = /^[0-9a-f]{64}$/;

function manifestProblem(value: unknown): string | null {
  if (typeof value !== 'object' || value === null) return 'not a JSON object';
  const manifest = value as Partial<BackupManifest>;
  if (manifest.format !== FORMAT) return `format must be "${FORMAT}", found ${JSON.stringify(manifest.format)}`;
  const database = manifest.database;
  if (!database || typeof database.file !== 'string' || !SHA256.test(String(database.sha256)) || !Number.isSafeInteger(database.bytes)) {
    return 'database: file, bytes and sha256 are required';
  }
  if (!Array.isArray(database.tables) || database.tables.some((table) => typeof table.name !== 'string' || !Number.isSafeInteger(table.rows))) {
    return 'database.tables: each entry needs a name and a whole number of rows';
  }
  const storage = manifest.storage;
  if (!storage || !Array.isArray(storage.objects)) return 'storage.objects is required';
  const bad = storage.objects.findIndex(
    (object) => typeof object.key !== 'string' || !SHA256.test(String(object.sha256)) || !Number.isSafeInteger(object.bytes),
  );
  if (bad >= 0) return `storage.objects[${bad}]: key, bytes and sha256 are required`;
  return null;
}
