import {
  parseCardinalAt,
  parseSpokenDecimalAt,
  parseSpokenDigitGroupAt,
  type WordNumberMatch,
} from './number-words';

/**
 * Mining a transcript for spoken measurements and part numbers. Every hit becomes a
 * *suggested* mark, so the rules below lean towards precision: a number only counts when a
 * length unit comes with it, and common non-measurements (times, dates, phone numbers,
 * counts of parts, years) are rejected.
 *
 * Shop vocabulary (common practice in US machining, documented here because it is not obvious):
 * - "thou", "thousandth" and "mil" all mean 0.001 in. (In British and Australian speech "mil"
 *   often means a millimetre; we follow the US machining sense and report inches.)
 * - A machinist's "tenth" is a ten-thousandth of an inch (0.0001 in), short for "a tenth of a thou".
 *   "A tenth of an inch" / "of a millimetre" keeps its literal meaning.
 * - Bare eighths, sixteenths, thirty-seconds, sixty-fourths and thousandths are inches.
 *
 * Values are computed with exact fractions (bigint) and only rounded when turned into numbers,
 * so "four tenths" is exactly 0.0004 and never 0.00039999999999999996.
 */

export type SpokenLengthUnit = 'mm' | 'um' | 'in';

export interface SpokenMeasurement {
  /** The words as they appear in the text: `text.slice(start, end)`. */
  phrase: string;
  /** Character offset of the first character. */
  start: number;
  /** Character offset just past the last character. */
  end: number;
  /** The amount in `unit` (thou, mil and tenths are reported in inches). */
  value: number;
  unit: SpokenLengthUnit;
  /** The same length in millimetres (1 in = 25.4 mm exactly), rounded to the nanometre. */
  millimetres: number;
}

export interface ExtractedMeasurements {
  /** In text order; at most the limit asked for. */
  measurements: SpokenMeasurement[];
  /** How many measurements the text holds (counted past the limit too). */
  total: number;
}

export interface PartNumberMention {
  /** The part number as it was given to `findPartNumbers`. */
  partNumber: string;
  phrase: string;
  start: number;
  end: number;
}

/* ---------------------------------------------------------------- exact fractions */

interface Fraction {
  numerator: bigint;
  denominator: bigint;
}

function gcd(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}

function fraction(numerator: bigint, denominator = 1n): Fraction {
  const divisor = gcd(numerator, denominator);
  return { numerator: numerator / divisor, denominator: denominator / divisor };
}

function times(a: Fraction, b: Fraction): Fraction {
  return fraction(a.numerator * b.numerator, a.denominator * b.denominator);
}

function plus(a: Fraction, b: Fraction): Fraction {
  return fraction(a.numerator * b.denominator + b.numerator * a.denominator, a.denominator * b.denominator);
}

/** "1.250" → 5/4, ".0004" → 1/2500; digits only, never through parseFloat. */
function fractionFromDecimal(whole: string, fractionDigits: string): Fraction {
  return fraction(BigInt(`${whole || '0'}${fractionDigits}`), 10n ** BigInt(fractionDigits.length));
}

/** Rounds half up to `decimals` places and returns the nearest double to that decimal. */
function toRoundedNumber(value: Fraction, decimals: number): number {
  const scale = 10n ** BigInt(decimals);
  const scaled = (value.numerator * scale * 2n + value.denominator) / (value.denominator * 2n);
  const digits = scaled.toString().padStart(decimals + 1, '0');
  return Number(`${digits.slice(0, -decimals)}.${digits.slice(-decimals)}`);
}

/* ---------------------------------------------------------------- units */

interface UnitScale {
  unit: SpokenLengthUnit;
  /** Size of one of these units, in `unit`. */
  size: Fraction;
}

const INCH: UnitScale = { unit: 'in', size: fraction(1n) };
const THOU: UnitScale = { unit: 'in', size: fraction(1n, 1000n) };
const TENTH: UnitScale = { unit: 'in', size: fraction(1n, 10_000n) };
const MICROINCH: UnitScale = { unit: 'in', size: fraction(1n, 1_000_000n) };
const MILLIMETRE: UnitScale = { unit: 'mm', size: fraction(1n) };
const MICROMETRE: UnitScale = { unit: 'um', size: fraction(1n) };

const MILLIMETRES_PER_UNIT: Readonly<Record<SpokenLengthUnit, Fraction>> = {
  in: fraction(254n, 10n), // 25.4 mm exactly (international inch)
  mm: fraction(1n),
  um: fraction(1n, 1000n),
};

const UNIT_WORDS: ReadonlyMap<string, UnitScale> = new Map(
  Object.entries({
  inch: INCH,
  inches: INCH,
  mm: MILLIMETRE,
  millimetre: MILLIMETRE,
  millimetres: MILLIMETRE,
  millimeter: MILLIMETRE,
  millimeters: MILLIMETRE,
  thou: THOU,
  thous: THOU,
  mil: THOU,
  mils: THOU,
  microinch: MICROINCH,
  microinches: MICROINCH,
  micron: MICROMETRE,
  microns: MICROMETRE,
  '\u00b5m': MICROMETRE, // µm with MICRO SIGN
  '\u03bcm': MICROMETRE, // μm with GREEK SMALL LETTER MU
  micrometre: MICROMETRE,
  micrometres: MICROMETRE,
  micrometer: MICROMETRE,
  micrometers: MICROMETRE,
  }),
);

/** "a micrometer" is the instrument far more often than one µm, so the article never counts there. */
const INSTRUMENT_NAMED_UNITS = new Set(['micrometre', 'micrometres', 'micrometer', 'micrometers']);

/** Units after "of a"/"half a": "of an inch", "half a thou", "half a tenth". */
const SINGULAR_UNIT_WORDS: ReadonlyMap<string, UnitScale> = new Map(
  Object.entries({
  inch: INCH,
  mm: MILLIMETRE,
  millimetre: MILLIMETRE,
  millimeter: MILLIMETRE,
  thou: THOU,
  thousandth: THOU,
  mil: THOU,
  tenth: TENTH,
  microinch: MICROINCH,
  micron: MICROMETRE,
  }),
);

const INCH_MARKS = new Set(['"', '\u2033', '\u201d']); // ", ″ (double prime), ” (typographic close quote)
const OPENING_MARKS = new Set(['(', '[', '{', '"', "'", '\u201c', '\u2018']);
const QUOTE_MARKS = new Set(['"', "'", '\u201c', '\u2018']);

/* ---------------------------------------------------------------- fractions of a unit */

interface DenominatorWord {
  words: readonly string[];
  divisor: bigint;
  /** What the fraction is of when no unit is said ("five sixteenths"); none means a unit is required. */
  bareUnit?: UnitScale;
}

function denominator(forms: readonly string[], divisor: bigint, bareUnit?: UnitScale): DenominatorWord[] {
  return forms.map((form) => ({ words: form.split(' '), divisor, bareUnit }));
}

/** Two-word forms first, so "two ten-thousandths" is 0.0002 in while "ten thousandths" is 0.010 in. */
const DENOMINATOR_WORDS: readonly DenominatorWord[] = [
  ...denominator(['ten thousandth', 'ten thousandths'], 10_000n, INCH),
  // No bare reading: "a thirty-second clip" is about time, so thirty-seconds need "of an inch" or "inch".
  ...denominator(['thirty second', 'thirty seconds'], 32n),
  ...denominator(['sixty fourth', 'sixty fourths'], 64n, INCH),
  ...denominator(['half', 'halves'], 2n),
  ...denominator(['third', 'thirds'], 3n),
  ...denominator(['quarter', 'quarters', 'fourth', 'fourths'], 4n),
  ...denominator(['fifth', 'fifths'], 5n),
  ...denominator(['sixth', 'sixths'], 6n),
  ...denominator(['seventh', 'sevenths'], 7n),
  ...denominator(['eighth', 'eighths'], 8n, INCH),
  ...denominator(['ninth', 'ninths'], 9n),
  // A machinist's tenth is a tenth of a thou (common practice).
  ...denominator(['tenth', 'tenths'], 10n, THOU),
  ...denominator(['sixteenth', 'sixteenths'], 16n, INCH),
  ...denominator(['hundredth', 'hundredths'], 100n),
  ...denominator(['thousandth', 'thousandths'], 1000n, INCH),
  // "fifty millionths" in the shop is microinches (common practice in US precision grinding).
  ...denominator(['millionth', 'millionths'], 1_000_000n, INCH),
];

/* ---------------------------------------------------------------- tokens */

interface Token {
  kind: 'word' | 'number' | 'symbol';
  text: string;
  /** Lower-case text, for matching words. */
  key: string;
  start: number;
  end: number;
  /** True for the second half of a hyphenated compound ("twenty-two"). */
  hyphenJoined: boolean;
  /** Only whitespace with at most one line break since the previous token (a blank line ends a phrase). */
  closeToPrevious: boolean;
}

const HYPHENS = new Set(['-', '\u2010', '\u2011']);
const APOSTROPHES = new Set(["'", '\u2019']);

const LINE_FEED = 0x0a;
const FULL_STOP = 0x2e;

function isAsciiDigit(code: number): boolean {
  return code >= 0x30 && code <= 0x39;
}

/** The characters JavaScript's `\s` matches, tested one code point at a time. */
function isWhitespace(code: number): boolean {
  if (code < 0x80) return code === 0x20 || (code >= 0x09 && code <= 0x0d);
  return /^\s$/u.test(String.fromCodePoint(code));
}

function isLetter(code: number): boolean {
  if (code < 0x80) return (code >= 0x41 && code <= 0x5a) || (code >= 0x61 && code <= 0x7a);
  return /^\p{L}$/u.test(String.fromCodePoint(code));
}

function codePointWidth(code: number): number {
  return code > 0xffff ? 2 : 1;
}

function endOfDigits(text: string, from: number): number {
  let at = from;
  while (at < text.length && isAsciiDigit(text.charCodeAt(at))) at += 1;
  return at;
}

function endOfLetters(text: string, from: number): number {
  let at = from;
  while (at < text.length) {
    const code = text.codePointAt(at) ?? 0;
    if (!isLetter(code)) break;
    at += codePointWidth(code);
  }
  return at;
}

/**
 * Work is cut into slices so a caller holding an event loop can let other work run between them
 * (`extractMeasurementsInSlices`); a slice is a few milliseconds at most.
 */
const SLICE_CHARACTERS = 4_096;
const SLICE_TOKENS = 1_024;

/** Runs sliced work to the end in one go. */
function runToEnd<T>(steps: Generator<void, T, void>): T {
  for (;;) {
    const step = steps.next();
    if (step.done) return step.value;
  }
}

/**
 * One left-to-right pass over the text: each character is looked at a bounded number of times,
 * so the time is linear in the length whatever the text holds (long runs of spaces included).
 * `measurement` reads decimals ("1.250", ".0004") and words with apostrophes ("shaft's") as one
 * token; `part-number` splits letters from digits, so "hl2107" is two tokens with nothing between.
 */
function* tokenize(text: string, forms: 'measurement' | 'part-number'): Generator<void, Token[], void> {
  const tokens: Token[] = [];
  let lineBreaks = 0;
  let at = 0;
  let sliceEnd = SLICE_CHARACTERS;
  while (at < text.length) {
    if (at >= sliceEnd) {
      sliceEnd = at + SLICE_CHARACTERS;
      yield;
    }
    const code = text.codePointAt(at) ?? 0;
    if (isWhitespace(code)) {
      if (code === LINE_FEED) lineBreaks += 1;
      at += codePointWidth(code);
      continue;
    }
    const start = at;
    let kind: Token['kind'];
    const decimalFirst = forms === 'measurement' && code === FULL_STOP && isAsciiDigit(text.charCodeAt(at + 1));
    if (isAsciiDigit(code) || decimalFirst) {
      kind = 'number';
      at = endOfDigits(text, decimalFirst ? at + 1 : at);
      if (forms === 'measurement' && !decimalFirst && text.charCodeAt(at) === FULL_STOP && isAsciiDigit(text.charCodeAt(at + 1))) {
        at = endOfDigits(text, at + 1);
      }
    } else if (isLetter(code)) {
      kind = 'word';
      at = endOfLetters(text, at);
      while (forms === 'measurement' && APOSTROPHES.has(text[at]) && isLetter(text.codePointAt(at + 1) ?? 0)) {
        at = endOfLetters(text, at + 1);
      }
    } else {
      kind = 'symbol';
      at += codePointWidth(code);
    }
    const piece = text.slice(start, at);
    tokens.push({
      kind,
      text: piece,
      key: piece.toLowerCase(),
      start,
      end: at,
      hyphenJoined: false,
      closeToPrevious: lineBreaks <= 1,
    });
    lineBreaks = 0;
  }
  return tokens;
}

/** Words and numbers for measurements; hyphens inside compounds ("twenty-two") are folded away. */
function* tokenizeForMeasurements(text: string): Generator<void, Token[], void> {
  const raw = yield* tokenize(text, 'measurement');
  const tokens: Token[] = [];
  for (let i = 0; i < raw.length; i += 1) {
    const [previous, current, next] = [raw[i - 1], raw[i], raw[i + 1]];
    const joinsWords =
      HYPHENS.has(current.text) &&
      previous?.kind === 'word' &&
      next?.kind === 'word' &&
      previous.end === current.start &&
      current.end === next.start;
    if (joinsWords) {
      next.hyphenJoined = true;
      continue;
    }
    tokens.push(current);
  }
  return tokens;
}

/**
 * The longest run of words handed to the number parsers. Spoken amounts are short ("nine hundred
 * ninety-nine thousand nine hundred ninety-nine" is eleven words); the cap keeps scanning linear on
 * unpunctuated automatic captions.
 */
const MAX_NUMBER_WORDS = 16;

/**
 * No reading has more digits than this ("1234.5678" is nine); a longer run of digits is a serial or
 * an accident, and turning it into an exact fraction would cost time growing faster than its length.
 */
const MAX_DIGIT_CHARACTERS = 16;

/** `right` follows `left` in the same phrase: a hyphen, or whitespace with at most one line break. */
function connected(right: Token): boolean {
  return right.hyphenJoined || right.closeToPrevious;
}

function adjacent(left: Token | undefined, right: Token | undefined): boolean {
  return left !== undefined && right !== undefined && left.end === right.start;
}

/* ---------------------------------------------------------------- measurement grammar */

type AmountKind = 'whole' | 'decimal' | 'fraction' | 'article' | 'implied';

interface Amount {
  value: Fraction;
  kind: AmountKind;
  /** The finest place the amount was said to: 1 for "fifteen", 1/1000 for "1.250", 1/8 for "3/8". */
  step: Fraction;
  /** Index of the first token after the amount. */
  next: number;
  /** The number opened a quotation, so a closing `"` is not an inch mark. */
  quoted: boolean;
}

interface Measured {
  quantity: Fraction;
  scale: UnitScale;
  next: number;
  /** The finest place said, in the same units as `quantity` ("fifteen thousandths" → 1/1000). */
  step: Fraction;
  /** "an inch and a quarter", "a tenth and a half": a plain count may take a trailing fraction. */
  takesTrailingFraction: boolean;
}

const ONE = fraction(1n);

function isLess(a: Fraction, b: Fraction): boolean {
  return a.numerator * b.denominator < b.numerator * a.denominator;
}

function inverse(value: Fraction): Fraction {
  return fraction(value.denominator, value.numerator);
}

class MeasurementScanner {
  /** Token index where the phrase being read starts. */
  private phraseStart = 0;

  constructor(
    private readonly text: string,
    private readonly tokens: Token[],
  ) {}

  /**
   * Each start position reads a bounded number of tokens ahead (number words are capped, units are
   * one or three words), and a hit moves past its phrase, so the scan is linear in the token count.
   */
  *scan(limit: number): Generator<void, ExtractedMeasurements, void> {
    const found: SpokenMeasurement[] = [];
    let total = 0;
    let sliceEnd = SLICE_TOKENS;
    for (let index = 0; index < this.tokens.length; ) {
      if (index >= sliceEnd) {
        sliceEnd = index + SLICE_TOKENS;
        yield;
      }
      const single = this.measurementAt(index);
      const measured = single && this.withFinerPart(single);
      if (!measured) {
        index += 1;
        continue;
      }
      total += 1;
      const start = this.tokens[index].start;
      const end = this.tokens[measured.next - 1].end;
      index = measured.next;
      // Past the limit a hit is only counted: the exact arithmetic is the costly part.
      if (found.length >= limit) continue;
      const value = times(measured.quantity, measured.scale.size);
      found.push({
        phrase: this.text.slice(start, end),
        start,
        end,
        value: toRoundedNumber(value, 9),
        unit: measured.scale.unit,
        millimetres: toRoundedNumber(times(value, MILLIMETRES_PER_UNIT[measured.scale.unit]), 6),
      });
    }
    return { measurements: found, total };
  }

  private measurementAt(index: number): Measured | null {
    this.phraseStart = index;
    const amount = this.tokens[index].kind === 'number' ? this.digitAmountAt(index) : this.wordAmountAt(index);
    if (!amount) return null;
    if (amount.kind !== 'fraction') {
      const fractional = this.fractionOfUnit(amount);
      if (fractional !== undefined) return fractional;
    }
    if (amount.kind === 'implied') return null;
    const mixed = amount.kind === 'whole' ? this.andFractionAfter(amount) : null;
    const total = mixed ?? amount;
    const unit = this.unitWordAt(total);
    if (unit) {
      return {
        quantity: total.value,
        scale: unit.scale,
        next: unit.next,
        step: total.step,
        takesTrailingFraction: total.kind === 'whole' || total.kind === 'article',
      };
    }
    if (amount.kind === 'fraction') return this.ofUnitAt(amount.next, amount.value, amount.step);
    return null;
  }

  /**
   * A reading said in two parts, coarse then finer, is one length: "one thousandth and two tenths"
   * (0.0012 in), "two inches and fifteen thousandths" (2.015 in). The second part must be in the
   * same unit system and smaller than the first part's finest place, or the two stay separate
   * ("two inches and three inches" is two lengths). Otherwise a trailing fraction may follow.
   */
  private withFinerPart(first: Measured): Measured {
    const andIndex = first.next;
    const partStart = andIndex + 1;
    const partToken = this.tokens[partStart];
    if (this.wordAt(andIndex) !== 'and' || partToken === undefined || !connected(partToken)) return first;
    const phraseStart = this.phraseStart;
    const second = this.measurementAt(partStart);
    this.phraseStart = phraseStart;
    if (second && second.scale.unit === first.scale.unit) {
      const secondLength = times(second.quantity, second.scale.size);
      if (isLess(secondLength, times(first.step, first.scale.size))) {
        const secondInFirstUnits = times(secondLength, inverse(first.scale.size));
        return {
          quantity: plus(first.quantity, secondInFirstUnits),
          scale: first.scale,
          next: second.next,
          step: times(second.step, times(second.scale.size, inverse(first.scale.size))),
          takesTrailingFraction: false,
        };
      }
    }
    return this.withTrailingFraction(first);
  }

  /** "an inch and a quarter", "three thou and a half", "a tenth and a half": a fraction of the finest place. */
  private withTrailingFraction(measured: Measured): Measured {
    if (!measured.takesTrailingFraction || this.wordAt(measured.next) !== 'and') return measured;
    const countIndex = measured.next + 1;
    const countWord = this.wordAt(countIndex);
    if (countWord === undefined) return measured;
    const count =
      countWord === 'a' || countWord === 'an' ? { value: 1, wordCount: 1 } : parseCardinalAt(this.wordRun(countIndex), 0);
    if (!count) return measured;
    const denominatorWord = this.denominatorAt(countIndex + count.wordCount);
    // Fractions with a unit of their own ("and two tenths") were read as a finer part, or are another length.
    if (!denominatorWord || denominatorWord.bareUnit) return measured;
    const after = this.wordAt(denominatorWord.next);
    if (after === 'of' || (after !== undefined && UNIT_WORDS.has(after))) return measured;
    const part = times(fraction(BigInt(count.value), denominatorWord.divisor), measured.step);
    return {
      ...measured,
      quantity: plus(measured.quantity, part),
      next: denominatorWord.next,
      step: times(measured.step, fraction(1n, denominatorWord.divisor)),
      takesTrailingFraction: false,
    };
  }

  /* ----- amounts */

  /** "22", "1.250", ".0004", "3/8", "1 3/8", "1-3/8" — rejecting times, dates, ratios and phone numbers. */
  private digitAmountAt(index: number): Amount | null {
    const tokens = this.tokens;
    const first = tokens[index];
    if (first.text.length > MAX_DIGIT_CHARACTERS) return null;
    const before = tokens[index - 1];
    let quoted = false;
    if (adjacent(before, first)) {
      if (!OPENING_MARKS.has(before.text)) return null; // "HL2107", "3:15", "555-0123", "1,250"
      quoted = QUOTE_MARKS.has(before.text);
    }
    const isWhole = (token: Token | undefined): token is Token =>
      token !== undefined && token.kind === 'number' && token.text.length <= MAX_DIGIT_CHARACTERS && /^[0-9]+$/u.test(token.text);
    const fractionAt = (at: number): { value: Fraction; next: number } | null => {
      const [top, slash, bottom, after] = [tokens[at], tokens[at + 1], tokens[at + 2], tokens[at + 3]];
      if (!isWhole(top) || slash?.text !== '/' || !isWhole(bottom)) return null;
      if (!adjacent(top, slash) || !adjacent(slash, bottom)) return null;
      if (after?.text === '/' && adjacent(bottom, after)) return null; // a date such as 3/8/2024
      const [numerator, denominatorValue] = [BigInt(top.text), BigInt(bottom.text)];
      // Only proper fractions: "24/7" is not a length, and mixed numbers cover the rest.
      if (numerator === 0n || numerator >= denominatorValue) return null;
      return { value: fraction(numerator, denominatorValue), next: at + 3 };
    };

    if (isWhole(first)) {
      // Mixed number: whole, then a space or a hyphen, then a proper fraction.
      const hyphen = tokens[index + 1];
      const fractionStart =
        HYPHENS.has(hyphen?.text ?? '') && adjacent(first, hyphen) ? index + 2 : index + 1;
      const next = tokens[index + 1];
      const separatedWell =
        fractionStart === index + 2
          ? adjacent(hyphen, tokens[index + 2])
          : next !== undefined && !adjacent(first, next) && connected(next);
      const part = separatedWell ? fractionAt(fractionStart) : null;
      if (part) {
        const value = plus(fraction(BigInt(first.text)), part.value);
        return { value, kind: 'fraction', step: fraction(1n, part.value.denominator), next: part.next, quoted };
      }
      const simple = fractionAt(index);
      if (simple) {
        return { value: simple.value, kind: 'fraction', step: fraction(1n, simple.value.denominator), next: simple.next, quoted };
      }
    }

    const after = tokens[index + 1];
    if (adjacent(first, after) && [':', '/', ',', '-', '\u2010', '\u2011'].includes(after.text)) {
      const beyond = tokens[index + 2];
      if (beyond?.kind === 'number' && adjacent(after, beyond)) return null; // 3:15, 24/7, 1,250, 555-0123
    }
    const [whole, fractionDigits = ''] = first.text.split('.');
    return {
      value: fractionFromDecimal(whole, fractionDigits),
      kind: first.text.includes('.') ? 'decimal' : 'whole',
      step: fraction(1n, 10n ** BigInt(fractionDigits.length)),
      next: index + 1,
      quoted,
    };
  }

  /** Lower-case words from `index` while they stay connected (token indexes follow on). */
  private wordRun(index: number): string[] {
    const words: string[] = [];
    for (let at = index; at < this.tokens.length && words.length < MAX_NUMBER_WORDS; at += 1) {
      const token = this.tokens[at];
      if (token.kind !== 'word') break;
      if (at > index && !connected(token)) break;
      words.push(token.key);
    }
    return words;
  }

  private wordAmountAt(index: number): Amount | null {
    const token = this.tokens[index];
    if (token.kind !== 'word' || token.hyphenJoined) return null;
    const words = this.wordRun(index);
    const decimal = parseSpokenDecimalAt(words, 0);
    if (decimal) {
      return {
        value: plus(fraction(BigInt(decimal.integerPart)), fractionFromDecimal('0', decimal.fractionDigits)),
        kind: 'decimal',
        step: fraction(1n, 10n ** BigInt(decimal.fractionDigits.length)),
        next: index + decimal.wordCount,
        quoted: false,
      };
    }
    const cardinal: WordNumberMatch | null = parseCardinalAt(words, 0);
    if (cardinal) {
      const value = fraction(BigInt(cardinal.value));
      return { value, kind: 'whole', step: ONE, next: index + cardinal.wordCount, quoted: false };
    }
    if (token.key === 'a' || token.key === 'an') {
      return { value: ONE, kind: 'article', step: ONE, next: index + 1, quoted: false };
    }
    // "half a thou", "quarter inch": the fraction word itself starts the phrase.
    if (token.key === 'half' || token.key === 'quarter') {
      return { value: ONE, kind: 'implied', step: ONE, next: index, quoted: false };
    }
    return null;
  }

  /* ----- what follows an amount */

  /** The word at `index` if it continues the phrase (the phrase's first word always does). */
  private wordAt(index: number): string | undefined {
    const token = this.tokens[index];
    if (token?.kind !== 'word') return undefined;
    const continues = index === this.phraseStart || connected(token);
    return continues ? token.key : undefined;
  }

  private wordsAt(index: number, expected: readonly string[]): boolean {
    return expected.every((word, offset) => this.wordAt(index + offset) === word);
  }

  private denominatorAt(index: number): (DenominatorWord & { next: number }) | null {
    for (const candidate of DENOMINATOR_WORDS) {
      if (this.wordsAt(index, candidate.words)) return { ...candidate, next: index + candidate.words.length };
    }
    return null;
  }

  /** "three eighths of an inch", "fifteen thousandths", "a tenth", "half a thou", "a quarter inch". */
  private fractionOfUnit(amount: Amount): Measured | null | undefined {
    const denominatorWord = this.denominatorAt(amount.next);
    if (!denominatorWord) return undefined;
    const perDenominator = fraction(1n, denominatorWord.divisor);
    const quantity = times(amount.value, perDenominator);
    const step = times(amount.step, perDenominator);
    const takesTrailingFraction = amount.kind === 'whole' || amount.kind === 'article';
    const after = denominatorWord.next;

    if (this.wordAt(after) === 'of') return this.ofUnitAt(after, quantity, step);
    const isHalf = denominatorWord.divisor === 2n;
    const article = this.wordAt(after);
    if (isHalf && (article === 'a' || article === 'an')) {
      const unit = SINGULAR_UNIT_WORDS.get(this.wordAt(after + 1) ?? '');
      if (unit) return { quantity, scale: unit, next: after + 2, step, takesTrailingFraction: false };
    }
    const unitWord = this.wordAt(after);
    const direct = unitWord !== undefined && !INSTRUMENT_NAMED_UNITS.has(unitWord) ? UNIT_WORDS.get(unitWord) : undefined;
    if (direct) return { quantity, scale: direct, next: after + 1, step, takesTrailingFraction };
    if (this.inchMarkAt(after, amount)) return { quantity, scale: INCH, next: after + 1, step, takesTrailingFraction };
    if (amount.kind !== 'implied' && denominatorWord.bareUnit) {
      return { quantity, scale: denominatorWord.bareUnit, next: after, step, takesTrailingFraction };
    }
    return null;
  }

  /** "of a millimetre", "of an inch", "of a thou" — or null ("a tenth of a second" is not a length). */
  private ofUnitAt(ofIndex: number, quantity: Fraction, step: Fraction): Measured | null {
    if (this.wordAt(ofIndex) !== 'of') return null;
    const article = this.wordAt(ofIndex + 1);
    if (article !== 'a' && article !== 'an') return null;
    const unit = SINGULAR_UNIT_WORDS.get(this.wordAt(ofIndex + 2) ?? '');
    return unit ? { quantity, scale: unit, next: ofIndex + 3, step, takesTrailingFraction: false } : null;
  }

  /** "one and a half", "two and three quarters": the amount grows; the unit is still required. */
  private andFractionAfter(amount: Amount): Amount | null {
    if (this.wordAt(amount.next) !== 'and') return null;
    const countIndex = amount.next + 1;
    const countWord = this.wordAt(countIndex);
    if (countWord === undefined) return null;
    const count =
      countWord === 'a' || countWord === 'an' ? { value: 1, wordCount: 1 } : parseCardinalAt(this.wordRun(countIndex), 0);
    if (!count) return null;
    const denominatorWord = this.denominatorAt(countIndex + count.wordCount);
    if (!denominatorWord) return null;
    const part = fraction(BigInt(count.value), denominatorWord.divisor);
    const step = fraction(1n, denominatorWord.divisor);
    return { ...amount, kind: 'fraction', value: plus(amount.value, part), step, next: denominatorWord.next };
  }

  /** `0.015"`, `3/8"`: an inch mark written right after digits (not closing a quotation). */
  private inchMarkAt(index: number, amount: Amount): boolean {
    const [mark, before] = [this.tokens[index], this.tokens[index - 1]];
    return (
      mark !== undefined && INCH_MARKS.has(mark.text) && before?.kind === 'number' && adjacent(before, mark) && !amount.quoted
    );
  }

  /** A unit said or written straight after the amount: "22 mm", "fifteen thou", "1.250 in", `0.015"`. */
  private unitWordAt(amount: Amount): { scale: UnitScale; next: number } | null {
    const index = amount.next;
    if (this.inchMarkAt(index, amount)) return { scale: INCH, next: index + 1 };
    const word = this.wordAt(index);
    if (word === undefined) return null;
    if (word === 'in') {
      // "3 in the vise" is not three inches; only decimals and fractions take the bare abbreviation.
      return amount.kind === 'decimal' || amount.kind === 'fraction' ? { scale: INCH, next: index + 1 } : null;
    }
    if (word === 'um') {
      // "um" is also a filler word in transcripts; only "22um" written together counts.
      return adjacent(this.tokens[index - 1], this.tokens[index]) ? { scale: MICROMETRE, next: index + 1 } : null;
    }
    const scale = UNIT_WORDS.get(word);
    if (!scale) return null;
    if (amount.kind === 'article' && (INSTRUMENT_NAMED_UNITS.has(word) || word === 'mm')) return null;
    return { scale, next: index + 1 };
  }
}

/**
 * Finds spoken or written lengths in transcript text.
 *
 * Digits need a unit ("22 mm", "1.250 inch", `0.015"`, "15 thou", ".0004 in", "3/8 inch",
 * "1 3/8 in"); words may carry their unit in the fraction ("fifteen thousandths", "a tenth",
 * "five sixteenths", "half a thou"). A decimal read digit by digit ("one point two five zero")
 * counts only when a unit follows. Bare "in" counts only after a decimal or a fraction.
 */
export function extractMeasurements(text: string): SpokenMeasurement[] {
  return runToEnd(extractMeasurementsInSlices(text)).measurements;
}

/**
 * `extractMeasurements` cut into slices of a few milliseconds: each `next()` does one slice and the
 * last returns the measurements, so a server can let other requests run between slices.
 */
export function* extractMeasurementsInSlices(
  text: string,
  options: { limit?: number } = {},
): Generator<void, ExtractedMeasurements, void> {
  const tokens = yield* tokenizeForMeasurements(text);
  return yield* new MeasurementScanner(text, tokens).scan(options.limit ?? Number.POSITIVE_INFINITY);
}

/* ---------------------------------------------------------------- part numbers */

/** Symbols that may sit between the pieces of a part number: "HL-2107", "HL.2107", "HL/2107". */
const PART_SEPARATORS = new Set(['-', '\u2010', '\u2011', '\u2013', '\u2014', '.', '/', '_']);

/** Below this, a digits-only part number is too easily an ordinary number ("1987", "2107" is fine). */
const MIN_DIGIT_ONLY_LENGTH = 4;
/** Below this, a part number with letters is too easily an ordinary word ("A1" in "a one"). */
const MIN_PART_NUMBER_LENGTH = 3;

class PartNumberMatcher {
  private readonly tokens: Token[];

  constructor(text: string) {
    // Letters and digits split apart, so "hl2107" is two tokens with nothing between them.
    this.tokens = runToEnd(tokenize(text, 'part-number'));
  }

  /** Every place `canonical` (upper-case letters and digits) is written or spoken. */
  findAll(canonical: string): { start: number; end: number }[] {
    const hits: { start: number; end: number }[] = [];
    for (let index = 0; index < this.tokens.length; index += 1) {
      const token = this.tokens[index];
      if (token.kind === 'symbol' || this.touchingPieces(this.tokens[index - 1], token)) continue;
      const end = this.matchFrom(index, canonical, 0);
      if (end !== null) {
        hits.push({ start: token.start, end: this.tokens[end - 1].end });
        index = end - 1;
      }
    }
    return hits;
  }

  /** True when two letter/digit tokens are written together, as in "xhl2107" or "2107b". */
  private touchingPieces(before: Token | undefined, token: Token): boolean {
    return before !== undefined && before.kind !== 'symbol' && token.kind !== 'symbol' && adjacent(before, token);
  }

  /** The next letter/digit token after `index`, skipping separators and whitespace. */
  private nextPiece(index: number): number | null {
    let at = index;
    while (at < this.tokens.length && PART_SEPARATORS.has(this.tokens[at].text)) at += 1;
    return at < this.tokens.length && this.tokens[at].kind !== 'symbol' ? at : null;
  }

  /** Spoken number words from `index`, skipping hyphens: indexes and lower-case words. */
  private spokenRun(index: number): { words: string[]; indexes: number[] } {
    const words: string[] = [];
    const indexes: number[] = [];
    for (let at = index; at < this.tokens.length && words.length < MAX_NUMBER_WORDS; at += 1) {
      const token = this.tokens[at];
      if (HYPHENS.has(token.text) && words.length > 0) continue;
      if (token.kind !== 'word') break;
      words.push(token.key);
      indexes.push(at);
    }
    return { words, indexes };
  }

  /** Backtracking match of `canonical[position..]`; returns the token index after the match. */
  private matchFrom(index: number, canonical: string, position: number): number | null {
    const token = this.tokens[index];
    const literal = token.text.toUpperCase();
    if (canonical.startsWith(literal, position)) {
      const end = this.continueAfter(index + 1, canonical, position + literal.length, false);
      if (end !== null) return end;
    }
    if (token.kind === 'word') {
      const run = this.spokenRun(index);
      const group = parseSpokenDigitGroupAt(run.words, 0);
      if (group && canonical.startsWith(group.digits, position)) {
        const after = run.indexes[group.wordCount - 1] + 1;
        const end = this.continueAfter(after, canonical, position + group.digits.length, true);
        if (end !== null) return end;
      }
    }
    return null;
  }

  private continueAfter(index: number, canonical: string, position: number, spoken: boolean): number | null {
    if (position === canonical.length) {
      const next = this.tokens[index];
      if (next && this.touchingPieces(this.tokens[index - 1], next)) return null; // "HL-2107B" is another part
      // "twenty-one oh seven five" keeps going: not this part.
      if (spoken && next?.kind === 'word' && parseSpokenDigitGroupAt([next.key], 0) !== null) return null;
      return index;
    }
    const piece = this.nextPiece(index);
    return piece === null ? null : this.matchFrom(piece, canonical, position);
  }
}

function canonicalPartNumber(partNumber: string): string {
  return partNumber.toUpperCase().replace(/[^\p{L}0-9]/gu, '');
}

/**
 * Finds mentions of known part numbers, tolerant of case, spacing, dashes and digits read aloud:
 * "HL-2107" matches "HL 2107", "hl2107", "H L twenty-one oh seven" and "HL twenty one zero seven".
 * Letters must be present when the part number has them; digits-only part numbers need at least
 * four digits. Where two part numbers match overlapping text, the longer (then the earlier in
 * `partNumbers`) wins.
 */
export function findPartNumbers(text: string, partNumbers: readonly string[]): PartNumberMention[] {
  const matcher = new PartNumberMatcher(text);
  const candidates: (PartNumberMention & { order: number })[] = [];
  partNumbers.forEach((partNumber, order) => {
    const canonical = canonicalPartNumber(partNumber);
    const digitsOnly = /^[0-9]+$/u.test(canonical);
    if (canonical.length < (digitsOnly ? MIN_DIGIT_ONLY_LENGTH : MIN_PART_NUMBER_LENGTH)) return;
    for (const { start, end } of matcher.findAll(canonical)) {
      candidates.push({ partNumber, phrase: text.slice(start, end), start, end, order });
    }
  });
  candidates.sort((a, b) => a.start - b.start || b.end - b.start - (a.end - a.start) || a.order - b.order);
  const kept: PartNumberMention[] = [];
  let coveredUntil = -1;
  for (const { order: _order, ...mention } of candidates) {
    if (mention.start < coveredUntil) continue;
    kept.push(mention);
    coveredUntil = mention.end;
  }
  return kept;
}
