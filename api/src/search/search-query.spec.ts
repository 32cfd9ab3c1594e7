import { isEmptySearch, parseSearchQuery } from './search-query';

describe('parseSearchQuery', () => {
  it('requires every word, by prefix, as the transcripts search does', () => {
    expect(parseSearchQuery('Pilot bearing')).toEqual({ terms: ['pilot', 'bearing'], booleanQuery: '+pilot* +bearing*', partNumberKeys: [] });
  });

  it('turns a hyphenated part number into its key, because FULLTEXT splits it at the hyphens', () => {
    const parsed = parseSearchQuery('HL-21-CPL coupler');
    expect(parsed.partNumberKeys).toEqual(['HL21CPL']);
    // FULLTEXT alone would look for "cpl" only (21 and HL are shorter than InnoDB's three-letter minimum).
    expect(parsed.terms).toEqual(['cpl', 'coupler']);
  });

  it('keeps boolean-mode operators out of the query: they are dropped, never passed on', () => {
    const parsed = parseSearchQuery('+spline -"coupler" (bore)* ~x@2 >seal <lip');
    expect(parsed.booleanQuery).toBe('+spline* +coupler* +bore* +seal* +lip*');
    expect(parsed.booleanQuery).not.toMatch(/["()~@<>-]/u);
  });

  it('makes no part-number key from words without digits or from keys shorter than three characters', () => {
    expect(parseSearchQuery('spline A-1').partNumberKeys).toEqual([]);
    expect(parseSearchQuery('a1b').partNumberKeys).toEqual(['A1B']);
  });

  it('says when nothing can be searched', () => {
    expect(isEmptySearch(parseSearchQuery('the 21 at'))).toBe(true);
    expect(isEmptySearch(parseSearchQuery('21-7'))).toBe(false);
  });
});
