import fc from 'fast-check';
import { GROWTH_ALLOWANCE, GROWTH_FACTOR, growthRatio } from '../testing/linear-time';
import { sanitizeRichText } from './rich-text';

/**
 * The rich-text cleaner under fuzzing (see engine/user-text.fuzz.spec.ts for the other parsers):
 * it never throws, keeps only the editor's tags, never lets a script, an event handler or a
 * `javascript:` link through, and takes linear time (8× the input at most 20× the time).
 */

const ALLOWED_TAGS = new Set(['p', 'br', 'strong', 'em', 's', 'u', 'code', 'pre', 'blockquote', 'ul', 'ol', 'li', 'h2', 'h3', 'h4', 'a', 'hr']);

const HTML_PIECES = [
  '<p>', '</p>', '<script>', '</script>', '<img src=x onerror=alert(1)>', '<a href="javascript:alert(1)">', '<a href="https://example.org">',
  '</a>', '<iframe>', '<style>', '<svg onload=x>', '<strong>', '</strong>', '<!--', '-->', '<![CDATA[', ']]>', '<', '>', '"', "'", '=',
  '&lt;', '&amp;', '&#x3C;', '&#60', 'java\tscript:', 'onclick=', ' ', '\n', 'text', '<ul><li>', '</li></ul>', '<p></p>', '\u0000',
];

const htmlLike = fc
  .array(fc.oneof({ weight: 3, arbitrary: fc.constantFrom(...HTML_PIECES) }, { weight: 1, arbitrary: fc.string({ maxLength: 8 }) }), { maxLength: 40 })
  .map((pieces) => pieces.join(''));

function tagsIn(html: string): string[] {
  return [...html.matchAll(/<\/?([a-zA-Z][a-zA-Z0-9]*)/gu)].map((match) => match[1].toLowerCase());
}

describe('rich-text cleaning under fuzzing', () => {
  it('never throws and keeps only the editor tags, with no scripts, handlers or javascript: links', () => {
    fc.assert(
      fc.property(fc.oneof(htmlLike, fc.string({ unit: 'grapheme', maxLength: 200 })), (html) => {
        const clean = sanitizeRichText(html);
        for (const tag of tagsIn(clean)) expect(ALLOWED_TAGS.has(tag)).toBe(true);
        expect(clean).not.toMatch(/<[^>]*\son[a-z]+\s*=/iu);
        expect(clean).not.toMatch(/href\s*=\s*["']?\s*javascript:/iu);
      }),
      { numRuns: 400 },
    );
  });

  it('takes linear time', () => {
    const shapes = fc.record({ head: htmlLike, filler: htmlLike.filter((text) => text.length > 0), tail: htmlLike });
    const known = [
      { head: '', filler: '<p></p>', tail: 'x' },
      { head: '<p>', filler: ' ', tail: '' },
      { head: '', filler: '<a href="', tail: '' },
      { head: '', filler: '<!--', tail: '' },
      { head: '<p>', filler: '<strong>', tail: '</p>' },
    ];
    fc.assert(
      fc.property(shapes, ({ head, filler, tail }) => {
        const count = Math.ceil(2_000 / filler.length);
        const small = `${head}${filler.repeat(count)}${tail}`;
        const large = `${head}${filler.repeat(count * GROWTH_FACTOR)}${tail}`;
        expect(growthRatio(sanitizeRichText, small, large)).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
      }),
      { numRuns: 4, examples: known.map((shape) => [shape]) },
    );
  });
});
