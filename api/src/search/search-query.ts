import { partNumberKey } from '../parts/part-number-key';
import { searchTerms } from '../transcripts/transcript-search';

/**
 * What a person typed in the search box → what the database is asked. Words go to FULLTEXT in boolean
 * mode through the transcripts' `searchTerms` (letters and digits only, so no boolean-mode operator
 * ever reaches MariaDB). Part numbers need more: FULLTEXT splits "HL-21-CPL" at the hyphens and drops
 * the short pieces, so every token that carries a digit is also turned into a part-number key
 * (upper case, letters and digits, as `parts.part_number_key` stores it) for exact and prefix matches.
 * One pass over the input; pure.
 */

export const MAX_SEARCH_TEXT = 200;
const MAX_PART_NUMBER_KEYS = 4;
const MIN_PART_NUMBER_KEY = 3;

export interface ParsedSearch {
  /** The words searched for, lower-case, in the order given. */
  terms: string[];
  /** AGAINST(... IN BOOLEAN MODE) text, or null when no word can be searched by FULLTEXT. */
  booleanQuery: string | null;
  /** Part-number keys to match exactly or by prefix (`part_number_key LIKE 'KEY%'`). */
  partNumberKeys: string[];
}

export function parseSearchQuery(input: string): ParsedSearch {
  const { terms, booleanQuery } = searchTerms(input);
  const keys = new Set<string>();
  for (const token of input.split(/\s+/u)) {
    if (keys.size >= MAX_PART_NUMBER_KEYS) break;
    if (!/\d/u.test(token)) continue;
    const key = partNumberKey(token);
    if (key.length >= MIN_PART_NUMBER_KEY) keys.add(key);
  }
  return { terms, booleanQuery, partNumberKeys: [...keys] };
}

/** True when nothing in the query can be searched: every word too short or a stopword, and no part number. */
export function isEmptySearch(parsed: ParsedSearch): boolean {
  return parsed.booleanQuery === null && parsed.partNumberKeys.length === 0;
}
