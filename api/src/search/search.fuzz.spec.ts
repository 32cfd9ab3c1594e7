import fc from 'fast-check';
import { GROWTH_ALLOWANCE, GROWTH_FACTOR, growthRatio } from '../testing/linear-time';
import { MAX_SEARCH_TEXT, parseSearchQuery } from './search-query';
import { highlightSnippet } from './search-snippet';

/**
 * The search box's parser and the snippet highlighter under fuzzing (see engine/user-text.fuzz.spec.ts
 * for the other parsers): they never throw, the boolean-mode query holds only `+word*` terms, and both
 * take linear time (8× the input at most 20× the time).
 */

const PIECES = ['+', '-', '"', '(', ')', '*', '~', '@', '<', '>', ' ', 'spline', 'HL-21-CPL', '0.750', 'ß', 'İ', '<p>', '&amp;', '\n', '21'];
const searchLike = fc
  .array(fc.oneof({ weight: 3, arbitrary: fc.constantFrom(...PIECES) }, { weight: 1, arbitrary: fc.string({ maxLength: 6 }) }), { maxLength: 40 })
  .map((pieces) => pieces.join(''));

describe('search text under fuzzing', () => {
  it('never throws and passes no boolean-mode operator to MariaDB', () => {
    fc.assert(
      fc.property(fc.oneof(searchLike, fc.string({ unit: 'grapheme', maxLength: 200 })), (input) => {
        const parsed = parseSearchQuery(input.slice(0, MAX_SEARCH_TEXT));
        if (parsed.booleanQuery !== null) expect(parsed.booleanQuery).toMatch(/^\+[\p{L}\p{N}]+\*( \+[\p{L}\p{N}]+\*)*$/u);
        for (const key of parsed.partNumberKeys) expect(key).toMatch(/^[A-Z0-9]{3,}$/u);
        const segments = highlightSnippet(input, parsed.terms);
        for (const segment of segments) expect(segment.text.length).toBeGreaterThan(0);
      }),
      { numRuns: 400 },
    );
  });

  it('takes linear time', () => {
    const shapes = fc.record({ filler: searchLike.filter((text) => text.length > 0) });
    const known = [{ filler: 'a' }, { filler: 'HL-21-CPL ' }, { filler: '<p' }, { filler: 'spline ' }, { filler: '+-"' }];
    // The query is at most MAX_SEARCH_TEXT characters (the DTO refuses more); the text it highlights may be long.
    const work = (input: string) => highlightSnippet(input, parseSearchQuery(input.slice(0, MAX_SEARCH_TEXT)).terms, input.length);
    fc.assert(
      fc.property(shapes, ({ filler }) => {
        const count = Math.ceil(2_000 / filler.length);
        expect(growthRatio(work, filler.repeat(count), filler.repeat(count * GROWTH_FACTOR))).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
      }),
      { numRuns: 4, examples: known.map((shape) => [shape]) },
    );
  });
});
