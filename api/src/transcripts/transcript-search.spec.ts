import { searchTerms } from './transcript-search';

describe('searchTerms', () => {
  it('requires every word and matches longer words by prefix', () => {
    expect(searchTerms('Pilot bearing')).toEqual({ terms: ['pilot', 'bearing'], booleanQuery: '+pilot* +bearing*' });
  });

  it('drops boolean operators, punctuation and duplicates, so user input is never query syntax', () => {
    expect(searchTerms('+spline -"coupler" (spline)* ~bore@2')).toEqual({
      terms: ['spline', 'coupler', 'bore'],
      booleanQuery: '+spline* +coupler* +bore*',
    });
  });

  it("skips words InnoDB does not index: shorter than three characters, or on its stopword list", () => {
    expect(searchTerms('the 21 at an')).toEqual({ terms: [], booleanQuery: null });
    expect(searchTerms('the 021 spline')).toEqual({ terms: ['021', 'spline'], booleanQuery: '+021* +spline*' });
  });

  it('keeps letters beyond ASCII', () => {
    expect(searchTerms('Größe Kupplung').terms).toEqual(['größe', 'kupplung']);
  });
});
