/**
 * Highlighted snippets as segments (`{ text, match }`), never HTML: the studio draws each segment as
 * text in a <mark> or a <span>, so whatever a creator or a transcript wrote is escaped by React and
 * nothing in a hit can become markup. Stored rich text is reduced to its words first. Linear in the
 * text: one tag-stripping pass, one regex pass whose terms are literal letters and digits.
 */

export interface SnippetSegment {
  text: string;
  match: boolean;
}

const DEFAULT_WIDTH = 180;
const MAX_INDEXED_WORD = 84;

/** Rich text (a step body, a summary) as the words a reader sees. */
export function plainWords(text: string): string {
  return text
    // [^<>] and not [^>]: an unclosed "<p<p<p…" would otherwise be scanned to the end from every "<".
    .replace(/<[^<>]*>/gu, ' ')
    .replace(/&nbsp;/gu, ' ')
    .replace(/&lt;/gu, '<')
    .replace(/&gt;/gu, '>')
    .replace(/&quot;/gu, '"')
    .replace(/&#39;/gu, "'")
    .replace(/&amp;/gu, '&')
    .replace(/\s+/gu, ' ')
    .trim();
}

/** A matcher for the words the search asked for, each also matching longer words (as `word*` does in FULLTEXT). */
function termPattern(terms: string[]): RegExp | null {
  // InnoDB indexes no word longer than 84 characters (innodb_ft_max_token_size), so none can be a hit.
  const literal = terms.filter((term) => term.length <= MAX_INDEXED_WORD && /^[\p{L}\p{N}]+$/u.test(term));
  if (literal.length === 0) return null;
  return new RegExp(`(?<![\\p{L}\\p{N}])(?:${literal.join('|')})[\\p{L}\\p{N}]*`, 'giu');
}

/**
 * Up to `width` characters of `text` around the first matching word, split into plain and matching
 * segments; "…" marks text left out at either end.
 */
export function highlightSnippet(text: string, terms: string[], width = DEFAULT_WIDTH): SnippetSegment[] {
  const words = plainWords(text);
  const pattern = termPattern(terms);
  const first = pattern ? pattern.exec(words) : null;
  let start = 0;
  if (first && first.index > width / 3) {
    start = first.index - Math.floor(width / 3);
    const space = words.indexOf(' ', start);
    if (space !== -1 && space < first.index) start = space + 1;
  }
  let end = Math.min(words.length, start + width);
  if (end < words.length) {
    const space = words.lastIndexOf(' ', end);
    if (space > start && (!first || space > first.index)) end = space;
  }
  const window = words.slice(start, end);
  const segments: SnippetSegment[] = [];
  const push = (piece: string, match: boolean) => {
    if (piece.length > 0) segments.push({ text: piece, match });
  };
  if (start > 0) push('… ', false);
  let cursor = 0;
  if (pattern) {
    pattern.lastIndex = 0;
    for (const hit of window.matchAll(pattern)) {
      push(window.slice(cursor, hit.index), false);
      push(hit[0], true);
      cursor = hit.index + hit[0].length;
    }
  }
  push(window.slice(cursor), false);
  if (end < words.length) push(' …', false);
  return segments;
}
