/**
 * Search text → a MariaDB FULLTEXT boolean-mode query. Every word must appear (`+word`), and each
 * word also matches longer ones (`spline*` finds "splines"). InnoDB indexes words of three or more
 * characters (innodb_ft_min_token_size) and skips its default stopwords, so those are dropped
 * here: a required stopword would match nothing. Pure.
 */

/** InnoDB's default stopword list (INFORMATION_SCHEMA.INNODB_FT_DEFAULT_STOPWORD), three letters or more. */
const INNODB_STOPWORDS = new Set([
  'about', 'are', 'com', 'for', 'from', 'how', 'that', 'the', 'this', 'was', 'what', 'when', 'where', 'who', 'will',
  'with', 'und', 'www',
]);

export const MIN_WORD_LENGTH = 3;
const MAX_TERMS = 8;

export interface SearchTerms {
  /** The words searched for, lower-case, in the order given. */
  terms: string[];
  /** The AGAINST(... IN BOOLEAN MODE) string, or null when no word can be searched. */
  booleanQuery: string | null;
}

export function searchTerms(input: string): SearchTerms {
  const words = input.normalize('NFC').toLowerCase().match(/[\p{L}\p{N}]+/gu) ?? [];
  const terms = [...new Set(words)]
    .filter((word) => [...word].length >= MIN_WORD_LENGTH && !INNODB_STOPWORDS.has(word))
    .slice(0, MAX_TERMS);
  return { terms, booleanQuery: terms.length === 0 ? null : terms.map((term) => `+${term}*`).join(' ') };
}
