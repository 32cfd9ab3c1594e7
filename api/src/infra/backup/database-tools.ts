import { spawn } from 'node:child_process';
import { createReadStream, createWriteStream } from 'node:fs';
import { mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { pipeline } from 'node:stream/promises';
import { createConnection, RowDataPacket } from 'mysql2/promise';
import { AppConfig } from '../../config/app-config';

export type DatabaseSettings = AppConfig['database'];

/**
 * Runs a MariaDB client tool with the app's credentials in a private option file, so the password
 * never appears in the process list. `--defaults-file` must be the first argument.
 */
async function withOptionFile<T>(database: DatabaseSettings, run: (optionFile: string) => Promise<T>): Promise<T> {
  const folder = await mkdtemp(join(tmpdir(), 'fitwright-db-'));
  const optionFile = join(folder, 'client.cnf');
  const quoted = (value: string) => `"${value.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
  await writeFile(
    optionFile,
    `[client]\nhost=${quoted(database.host)}\nport=${database.port}\nuser=${quoted(database.user)}\npassword=${quoted(database.password)}\n`,
    { mode: 0o600 },
  );
  try {
    return await run(optionFile);
  } finally {
    await rm(folder, { recursive: true, force: true });
  }
}

/** Waits for a child process; rejects with its last stderr lines when it fails. */
function finished(child: ReturnType<typeof spawn>, tool: string): Promise<void> {
  let stderr = '';
  child.stderr?.on('data', (chunk: Buffer) => {
    stderr = (stderr + chunk.toString()).slice(-4000);
  });
  return new Promise((resolve, reject) => {
    child.on('error', (error) => reject(new Error(`${tool} could not start: ${error.message}`)));
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`${tool} failed (exit ${code}): ${stderr.trim()}`))));
  });
}

/**
 * Writes a consistent dump of the whole database to `file`: `--single-transaction` reads one
 * snapshot of the InnoDB tables without locking the app out; routines, triggers and events are
 * included; binary columns as hex. No CREATE DATABASE / USE, so it loads into any database name.
 */
export async function dumpDatabase(database: DatabaseSettings, file: string): Promise<void> {
  await withOptionFile(database, async (optionFile) => {
    const child = spawn(
      'mariadb-dump',
      [
        `--defaults-file=${optionFile}`,
        '--protocol=TCP',
        '--single-transaction',
        '--quick',
        '--routines',
        '--triggers',
        '--events',
        '--hex-blob',
        '--default-character-set=utf8mb4',
        database.name,
      ],
      { stdio: ['ignore', 'pipe', 'pipe'] },
    );
    const done = finished(child, 'mariadb-dump');
    await Promise.all([pipeline(child.stdout, createWriteStream(file)), done]);
  });
}

/** Loads a dump written by `dumpDatabase` into the (empty) database named in `database`. */
export async function loadDump(database: DatabaseSettings, file: string): Promise<void> {
  await withOptionFile(database, async (optionFile) => {
    const child = spawn(
      'mariadb',
      [`--defaults-file=${optionFile}`, '--protocol=TCP', '--default-character-set=utf8mb4', '--binary-mode', database.name],
      { stdio: ['pipe', 'ignore', 'pipe'] },
    );
    const done = finished(child, 'mariadb');
    await Promise.all([pipeline(createReadStream(file), child.stdin), done]);
  });
}

/** A short-lived connection for the few questions backup and restore ask the database. */
export class DatabaseInspector {
  private constructor(private readonly connection: Awaited<ReturnType<typeof createConnection>>) {}

  static async open(database: DatabaseSettings): Promise<DatabaseInspector> {
    const connection = await createConnection({
      host: database.host,
      port: database.port,
      user: database.user,
      password: database.password,
      database: database.name,
      charset: 'utf8mb4_unicode_ci',
      supportBigNumbers: true,
      bigNumberStrings: true,
    });
    return new DatabaseInspector(connection);
  }

  async close(): Promise<void> {
    await this.connection.end();
  }

  /** Base tables and views of the current database, by name. */
  async tables(): Promise<{ name: string; kind: 'table' | 'view' }[]> {
    const [rows] = await this.connection.query<RowDataPacket[]>(
      'SELECT table_name AS name, table_type AS type FROM information_schema.tables WHERE table_schema = DATABASE() ORDER BY table_name',
    );
    return rows.map((row) => ({ name: String(row.name), kind: row.type === 'VIEW' ? 'view' : 'table' }));
  }

  async rowCount(table: string): Promise<number> {
    const [rows] = await this.connection.query<RowDataPacket[]>(`SELECT COUNT(*) AS n FROM ${quoteIdentifier(table)}`);
    return Number(rows[0].n);
  }

  /** `CHECKSUM TABLE`: equal for tables with the same definition and the same rows. */
  async checksum(table: string): Promise<string> {
    const [rows] = await this.connection.query<RowDataPacket[]>(`CHECKSUM TABLE ${quoteIdentifier(table)} EXTENDED`);
    return String(rows[0].Checksum);
  }

  /** The newest applied TypeORM migration, or null when the migrations table is missing or empty. */
  async migrationLevel(): Promise<{ name: string; timestamp: number; applied: number } | null> {
    const tables = await this.tables();
    if (!tables.some((table) => table.name === 'migrations')) return null;
    const [rows] = await this.connection.query<RowDataPacket[]>(
      'SELECT name, timestamp, (SELECT COUNT(*) FROM migrations) AS applied FROM migrations ORDER BY timestamp DESC, id DESC LIMIT 1',
    );
    if (rows.length === 0) return null;
    return { name: String(rows[0].name), timestamp: Number(rows[0].timestamp), applied: Number(rows[0].applied) };
  }

  /** Drops every table and view (used by a forced restore over a non-empty database). */
  async dropEverything(): Promise<void> {
    const tables = await this.tables();
    await this.connection.query('SET FOREIGN_KEY_CHECKS = 0');
    try {
      for (const table of tables) {
        await this.connection.query(`DROP ${table.kind === 'view' ? 'VIEW' : 'TABLE'} IF EXISTS ${quoteIdentifier(table.name)}`);
      }
    } finally {
      await this.connection.query('SET FOREIGN_KEY_CHECKS = 1');
    }
  }
}

function quoteIdentifier(name: string): string {
  return `\`${name.replace(/`/g, '``')}\``;
}
