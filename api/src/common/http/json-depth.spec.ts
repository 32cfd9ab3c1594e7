import { jsonNestingExceeds } from './json-depth';

describe('jsonNestingExceeds', () => {
  it('counts nesting of objects and arrays (RFC 8259 grammar: objects and arrays nest, strings do not)', () => {
    expect(jsonNestingExceeds('{"a":[1,{"b":[]}]}', 4)).toBe(false);
    expect(jsonNestingExceeds('{"a":[1,{"b":[]}]}', 3)).toBe(true);
    expect(jsonNestingExceeds('1', 0)).toBe(false);
  });

  it('ignores brackets inside strings, including after escaped quotes and backslashes', () => {
    expect(jsonNestingExceeds('{"text":"[[[[{{{{"}', 1)).toBe(false);
    expect(jsonNestingExceeds('{"text":"a\\"[[[[\\\\"}', 1)).toBe(false);
    expect(jsonNestingExceeds('{"text":"a\\\\","x":[[1]]}', 2)).toBe(true);
  });

  it('reads a Buffer as express hands it over, multi-byte text included', () => {
    expect(jsonNestingExceeds(Buffer.from('{"title":"µm ± 0,5 — «[[»"}'), 1)).toBe(false);
    expect(jsonNestingExceeds(Buffer.from('['.repeat(65) + ']'.repeat(65)), 64)).toBe(true);
  });

  it('stays linear: a body a hundred times longer takes well under a thousand times as long', () => {
    const measure = (copies: number) => {
      const body = Buffer.from(`[${'{"a":[1,2,{"b":"[[["}],"c":"x"},'.repeat(copies)}0]`);
      const started = process.hrtime.bigint();
      for (let round = 0; round < 5; round++) jsonNestingExceeds(body, 64);
      return Number(process.hrtime.bigint() - started);
    };
    measure(1000);
    const ratio = measure(100_000) / measure(1000);
    expect(ratio).toBeLessThan(1000);
  });
});
