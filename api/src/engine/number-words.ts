/**
 * English number words, as people say them in the shop.
 *
 * Covers cardinals below one million ("zero" … "nine hundred ninety-nine thousand …"),
 * hyphenated compounds ("twenty-two"), the British "and" ("one hundred and five"),
 * "a"/"an" as one ("a hundred"), "half", mixed numbers ("two and a half"), and decimals
 * spoken digit by digit ("one point two five zero", "point zero one five").
 *
 * The word-level functions take lower-case words with hyphens already split off, so the
 * measurement and part-number finders can map every word back to its place in the text.
 */

const ONES: Readonly<Record<string, number>> = {
  zero: 0,
  one: 1,
  two: 2,
  three: 3,
  four: 4,
  five: 5,
  six: 6,
  seven: 7,
  eight: 8,
  nine: 9,
};

const TEENS: Readonly<Record<string, number>> = {
  ten: 10,
  eleven: 11,
  twelve: 12,
  thirteen: 13,
  fourteen: 14,
  fifteen: 15,
  sixteen: 16,
  seventeen: 17,
  eighteen: 18,
  nineteen: 19,
};

const TENS: Readonly<Record<string, number>> = {
  twenty: 20,
  thirty: 30,
  forty: 40,
  fifty: 50,
  sixty: 60,
  seventy: 70,
  eighty: 80,
  ninety: 90,
};

/** Words read as a single digit when digits are spoken one by one ("point oh one five"). */
const DIGIT_WORDS: Readonly<Record<string, number>> = {
  ...ONES,
  oh: 0,
  o: 0,
  nought: 0,
  naught: 0,
};

const ARTICLES = new Set(['a', 'an']);

function lookup(table: Readonly<Record<string, number>>, word: string | undefined): number | undefined {
  return word !== undefined && Object.hasOwn(table, word) ? table[word] : undefined;
}

export interface WordNumberMatch {
  value: number;
  /** How many words, from the start position, the number used. */
  wordCount: number;
}

/** The value of a digit word ("oh" and "nought" included), or undefined. */
export function digitWordValue(word: string): number | undefined {
  return lookup(DIGIT_WORDS, word);
}

/** 1–99: "seven", "fifteen", "forty", "forty two". */
function parseBelowHundred(words: readonly string[], from: number): WordNumberMatch | null {
  const tens = lookup(TENS, words[from]);
  if (tens !== undefined) {
    const ones = lookup(ONES, words[from + 1]);
    // "twenty zero" is not a number; "twenty" alone is.
    return ones !== undefined && ones > 0 ? { value: tens + ones, wordCount: 2 } : { value: tens, wordCount: 1 };
  }
  const teen = lookup(TEENS, words[from]);
  if (teen !== undefined) return { value: teen, wordCount: 1 };
  const ones = lookup(ONES, words[from]);
  return ones !== undefined && ones > 0 ? { value: ones, wordCount: 1 } : null;
}

/**
 * A tail after "hundred"/"thousand": optional "and", then a smaller number.
 * Returns null when there is no tail, so a dangling "and" is never swallowed.
 */
function parseTail(
  words: readonly string[],
  from: number,
  parseSmaller: (w: readonly string[], f: number) => WordNumberMatch | null,
): WordNumberMatch | null {
  const andWords = words[from] === 'and' ? 1 : 0;
  const rest = parseSmaller(words, from + andWords);
  return rest ? { value: rest.value, wordCount: andWords + rest.wordCount } : null;
}

/**
 * 1–9999 without "thousand": "a hundred", "two hundred and five", and the spoken
 * "fifteen hundred" / "twenty-five hundred" (= 1500 / 2500).
 */
function parseBelowThousandGroup(words: readonly string[], from: number): WordNumberMatch | null {
  let multiplier: WordNumberMatch | null;
  if (ARTICLES.has(words[from] ?? '') && words[from + 1] === 'hundred') {
    multiplier = { value: 1, wordCount: 1 };
  } else {
    multiplier = parseBelowHundred(words, from);
  }
  if (!multiplier) return null;
  if (words[from + multiplier.wordCount] !== 'hundred') {
    return ARTICLES.has(words[from] ?? '') ? null : multiplier;
  }
  let value = multiplier.value * 100;
  let wordCount = multiplier.wordCount + 1;
  const tail = parseTail(words, from + wordCount, parseBelowHundred);
  if (tail) {
    value += tail.value;
    wordCount += tail.wordCount;
  }
  return { value, wordCount };
}

/**
 * The longest cardinal (0 ≤ n < 1 000 000) starting at `words[from]`, or null.
 * Greedy but strict: "two ten" is just "two" (the caller sees `wordCount: 1`).
 */
export function parseCardinalAt(words: readonly string[], from: number): WordNumberMatch | null {
  if (words[from] === 'zero') return { value: 0, wordCount: 1 };
  let head: WordNumberMatch | null;
  if (ARTICLES.has(words[from] ?? '') && words[from + 1] === 'thousand') {
    head = { value: 1, wordCount: 1 };
  } else {
    head = parseBelowThousandGroup(words, from);
  }
  if (!head) return null;
  const afterHead = from + head.wordCount;
  // "fifteen hundred thousand" is not said; only a plain group below 1000 takes "thousand".
  if (words[afterHead] !== 'thousand' || head.value >= 1000) return head;
  let value = head.value * 1000;
  let wordCount = head.wordCount + 1;
  const tail = parseTail(words, from + wordCount, (w, f) => {
    const group = parseBelowThousandGroup(w, f);
    return group && group.value < 1000 ? group : null;
  });
  if (tail) {
    value += tail.value;
    wordCount += tail.wordCount;
  }
  return { value, wordCount };
}

export interface SpokenDecimalMatch {
  /** The whole-number part (0 when the phrase starts with "point"). */
  integerPart: number;
  /** The digits after "point", exactly as spoken ("two five zero" → "250"). */
  fractionDigits: string;
  wordCount: number;
}

/**
 * A decimal spoken digit by digit: "[cardinal] point digit digit …".
 * "one point two five zero" → 1 and "250"; "point zero one five" → 0 and "015".
 */
export function parseSpokenDecimalAt(words: readonly string[], from: number): SpokenDecimalMatch | null {
  // British speech says "nought point nought five" for 0.05.
  const whole =
    words[from] === 'nought' || words[from] === 'naught' ? { value: 0, wordCount: 1 } : parseCardinalAt(words, from);
  const pointAt = from + (whole?.wordCount ?? 0);
  if (words[pointAt] !== 'point') return null;
  let fractionDigits = '';
  let at = pointAt + 1;
  while (at < words.length) {
    const digit = digitWordValue(words[at]);
    if (digit === undefined) break;
    fractionDigits += String(digit);
    at += 1;
  }
  if (fractionDigits === '') return null;
  return { integerPart: whole?.value ?? 0, fractionDigits, wordCount: at - from };
}

/**
 * Digits as read out one group at a time, the way people say part numbers:
 * "twenty-one" → "21", "oh" → "0", "seven" → "7", "ten" → "10", "twenty" → "20",
 * "twenty-one hundred" → "2100". Returns null when `words[from]` is not a number word.
 */
export function parseSpokenDigitGroupAt(
  words: readonly string[],
  from: number,
): { digits: string; wordCount: number } | null {
  let digits: string;
  let wordCount: number;
  const digit = digitWordValue(words[from] ?? '');
  if (digit !== undefined) {
    digits = String(digit);
    wordCount = 1;
  } else {
    const group = parseBelowHundred(words, from);
    if (!group) return null;
    digits = String(group.value);
    wordCount = group.wordCount;
  }
  if (words[from + wordCount] === 'hundred') {
    digits += '00';
    wordCount += 1;
  }
  return { digits, wordCount };
}

/** Splits a phrase into lower-case words; hyphens join compounds like "twenty-two". */
export function splitNumberWords(phrase: string): string[] {
  return phrase
    .toLowerCase()
    .split(/[\s\-\u2010\u2011]+/u)
    .filter((word) => word !== '');
}

/**
 * The value of a whole phrase made only of number words, or null if any word is left over.
 * Accepts cardinals, spoken decimals, "a"/"an" (= 1), "half" / "a half" (= 0.5) and
 * "<cardinal> and a half". Decimal results are built from the spoken digits, so
 * "one point two five zero" is exactly the double nearest 1.25.
 */
export function parseNumberWords(phrase: string): number | null {
  const words = splitNumberWords(phrase);
  if (words.length === 0) return null;
  const whole = (match: { wordCount: number } | null): boolean => match !== null && match.wordCount === words.length;

  const decimal = parseSpokenDecimalAt(words, 0);
  if (decimal && whole(decimal)) return Number(`${decimal.integerPart}.${decimal.fractionDigits}`);

  const joined = words.join(' ');
  if (joined === 'half' || joined === 'a half' || joined === 'one half') return 0.5;
  if (words.length === 1 && ARTICLES.has(joined)) return 1;

  const cardinal = parseCardinalAt(words, 0);
  if (cardinal && whole(cardinal)) return cardinal.value;
  if (cardinal && words.slice(cardinal.wordCount).join(' ') === 'and a half') return cardinal.value + 0.5;
  return null;
}
