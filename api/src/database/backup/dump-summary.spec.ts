import { DumpSummaryReader } from './dump-summary';

function summarise(lines: string[]): [string, number][] {
  const reader = new DumpSummaryReader();
  for (const line of lines) reader.readLine(line);
  return [...reader.summary().rowsByTable];
}

// Statements in the shapes mariadb-dump writes them: 10.11.19 (this machine) puts each row of an extended
// INSERT on its own line, older releases one INSERT a line; backslash escapes and hex blobs as it writes them.
describe('DumpSummaryReader', () => {
  it('counts rows of a row-per-line INSERT (mariadb-dump 10.11.19) and lists empty tables with 0', () => {
    expect(
      summarise([
        'DROP TABLE IF EXISTS `users`;',
        'CREATE TABLE `users` (',
        '  `id` char(36) NOT NULL,',
        ') ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci;',
        'CREATE TABLE `empty_one` (',
        'LOCK TABLES `users` WRITE;',
        'INSERT INTO `users` VALUES',
        "('a','Ann (owner)'),",
        "('b','it\\'s (not); a row'),",
        "('c',0x28292829);",
        'UNLOCK TABLES;',
        "INSERT INTO `users` VALUES ('d','two\\\\'),('e','\"(\"');",
      ]),
    ).toEqual([
      ['users', 5],
      ['empty_one', 0],
    ]);
  });

  it('reads a table name holding an escaped backtick', () => {
    expect(summarise(['INSERT INTO `odd``name` VALUES (1),(2);'])).toEqual([['odd`name', 2]]);
  });

  it('refuses a dump that ends inside an INSERT (truncated)', () => {
    const reader = new DumpSummaryReader();
    reader.readLine('INSERT INTO `users` VALUES');
    reader.readLine("('a','unfinished");
    expect(() => reader.summary()).toThrow(/ends inside the INSERT into users: it is truncated/);
  });

  it('doubled quotes (NO_BACKSLASH_ESCAPES dumps) do not end the value', () => {
    expect(summarise(["INSERT INTO `t` VALUES ('it''s (one)'),('two');"])).toEqual([['t', 2]]);
  });

  it('takes time linear in the dump length (ratio of a 16x longer dump, generous bound)', () => {
    const row = "('x','a (b) \\' c; d',0x00),";
    const measure = (rows: number) => {
      const started = process.hrtime.bigint();
      for (let round = 0; round < 3; round++) {
        const reader = new DumpSummaryReader();
        reader.readLine('INSERT INTO `t` VALUES');
        for (let index = 0; index < rows; index++) reader.readLine(row);
        reader.readLine("('last');");
        expect(reader.summary().rowsByTable.get('t')).toBe(rows + 1);
      }
      return Number(process.hrtime.bigint() - started);
    };
    measure(2_000); // warm-up
    const small = measure(10_000);
    const large = measure(160_000);
    expect(large / small).toBeLessThan(16 * 4);
  });
});
