/**
 * Reads what a `mariadb-dump` file holds: the tables it creates and how many rows it inserts into
 * each. The manifest's row counts come from the dump itself, so they describe exactly the snapshot
 * that `--single-transaction` took, even while the app kept writing. Pure; one pass, linear time.
 */

export interface DumpSummary {
  /** Table name → rows inserted; every created table is listed, empty ones with 0. */
  rowsByTable: Map<string, number>;
}

const CREATE_TABLE = 'CREATE TABLE `';
const INSERT_INTO = 'INSERT INTO `';
const VALUES = '` VALUES';

/**
 * Accumulates a summary line by line. An extended INSERT may sit on one line (older mariadb-dump)
 * or put each row on its own line (10.11.19 here), so the scanner keeps its place across lines
 * until the statement's closing semicolon.
 */
export class DumpSummaryReader {
  private readonly rowsByTable = new Map<string, number>();
  /** The table of the INSERT being read, or null between statements. */
  private insertTable: string | null = null;
  private depth = 0;
  private quote: string | null = null;
  private escaped = false;

  readLine(line: string): void {
    if (this.insertTable !== null) {
      this.scanValues(line, 0);
      return;
    }
    if (line.startsWith(CREATE_TABLE)) {
      const name = quotedName(line, CREATE_TABLE.length);
      if (name !== null && !this.rowsByTable.has(name)) this.rowsByTable.set(name, 0);
      return;
    }
    if (!line.startsWith(INSERT_INTO)) return;
    const name = quotedName(line, INSERT_INTO.length);
    if (name === null) throw new Error(`unreadable table name in: ${line.slice(0, 80)}`);
    const valuesAt = INSERT_INTO.length + name.replace(/`/g, '``').length;
    if (!line.startsWith(VALUES, valuesAt)) throw new Error(`unexpected INSERT without VALUES: ${line.slice(0, 80)}`);
    this.insertTable = name;
    if (!this.rowsByTable.has(name)) this.rowsByTable.set(name, 0);
    this.scanValues(line, valuesAt + VALUES.length);
  }

  /** The summary of a complete dump; a dump that stops inside an INSERT is refused. */
  summary(): DumpSummary {
    if (this.insertTable !== null) throw new Error(`the dump ends inside the INSERT into ${this.insertTable}: it is truncated`);
    return { rowsByTable: new Map(this.rowsByTable) };
  }

  /**
   * Counts top-level parenthesised tuples, skipping quoted strings (backslash escapes, as mariadb-dump
   * writes them, and doubled quotes) so that a bracket inside a value never counts.
   */
  private scanValues(line: string, from: number): void {
    const table = this.insertTable as string;
    let tuples = 0;
    for (let index = from; index < line.length; index++) {
      const char = line[index];
      if (this.quote !== null) {
        if (this.escaped) this.escaped = false;
        else if (char === '\\') this.escaped = true;
        else if (char === this.quote) this.quote = null;
        continue;
      }
      if (char === "'" || char === '"') this.quote = char;
      else if (char === '(') {
        if (this.depth === 0) tuples++;
        this.depth++;
      } else if (char === ')') this.depth--;
      else if (char === ';' && this.depth === 0) {
        this.insertTable = null;
        break;
      }
    }
    this.rowsByTable.set(table, (this.rowsByTable.get(table) ?? 0) + tuples);
  }
}

/** Reads a backtick-quoted identifier starting at `from` (just after the opening backtick); `` is an escaped backtick. */
function quotedName(line: string, from: number): string | null {
  let name = '';
  for (let index = from; index < line.length; index++) {
    const char = line[index];
    if (char !== '`') {
      name += char;
      continue;
    }
    if (line[index + 1] === '`') {
      name += '`';
      index++;
      continue;
    }
    return name;
  }
  return null;
}
