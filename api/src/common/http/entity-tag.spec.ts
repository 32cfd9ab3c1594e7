import { entityTagOf, matchesIfNoneMatch } from './entity-tag';

describe('entityTagOf', () => {
  it('is a quoted strong tag (RFC 9110 §8.8.3: no W/ prefix), equal for equal state and different otherwise', () => {
    const tag = entityTagOf({ revision: 'a', checks: '2:2026-12-04 16:00:00.000' });
    expect(tag).toMatch(/^"[A-Za-z0-9_-]{32}"$/);
    expect(entityTagOf({ revision: 'a', checks: '2:2026-12-04 16:00:00.000' })).toBe(tag);
    expect(entityTagOf({ revision: 'a', checks: '2:2026-12-04 16:00:00.001' })).not.toBe(tag);
  });
});

describe('matchesIfNoneMatch', () => {
  const tag = entityTagOf('state');
  const cases: { headers: Record<string, string>; expected: boolean; why: string }[] = [
    { headers: {}, expected: false, why: 'unconditional request' },
    { headers: { 'if-none-match': tag }, expected: true, why: 'the same tag (RFC 9110 §13.1.2)' },
    { headers: { 'if-none-match': `W/${tag}` }, expected: true, why: 'weak comparison ignores W/ (RFC 9110 §8.8.3.2)' },
    { headers: { 'if-none-match': `"other", ${tag}` }, expected: true, why: 'one of a list' },
    { headers: { 'if-none-match': `"other",${tag} ` }, expected: true, why: 'a list without spaces' },
    { headers: { 'if-none-match': '*' }, expected: true, why: 'any current representation (RFC 9110 §13.1.2)' },
    { headers: { 'if-none-match': '"other"' }, expected: false, why: 'another tag' },
    { headers: { 'if-none-match': `\t${tag}` }, expected: false, why: 'a tab is not trimmed by Express either' },
    { headers: { 'if-none-match': tag, 'cache-control': 'no-cache' }, expected: false, why: 'a reload asks for the full answer' },
    { headers: { 'if-none-match': tag, 'cache-control': 'max-age=0, no-cache' }, expected: false, why: 'no-cache within a list' },
    { headers: { 'if-none-match': tag, 'if-modified-since': 'Fri, 04 Dec 2026 16:00:00 GMT' }, expected: true, why: 'If-None-Match takes precedence (RFC 9110 §13.1.3)' },
  ];

  it.each(cases)('$why', ({ headers, expected }) => {
    expect(matchesIfNoneMatch(headers, tag)).toBe(expected);
  });
});
