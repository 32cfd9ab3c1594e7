import wordsToNumbers from 'words-to-numbers';
import {
  digitWordValue,
  parseCardinalAt,
  parseNumberWords,
  parseSpokenDecimalAt,
  parseSpokenDigitGroupAt,
  splitNumberWords,
} from './number-words';

describe('number words', () => {
  describe('cardinals', () => {
    it.each([
      ['zero', 0],
      ['seven', 7],
      ['eleven', 11],
      ['nineteen', 19],
      ['twenty', 20],
      ['twenty-two', 22],
      ['twenty two', 22],
      ['ninety-nine', 99],
      ['a hundred', 100],
      ['one hundred', 100],
      ['one hundred and five', 105],
      ['one hundred five', 105],
      ['two hundred forty-seven', 247],
      ['fifteen hundred', 1500],
      ['twenty-five hundred', 2500],
      ['a thousand', 1000],
      ['one thousand and one', 1001],
      ['twelve thousand five hundred', 12_500],
      ['seven hundred thousand', 700_000],
      ['nine hundred ninety-nine thousand nine hundred ninety-nine', 999_999],
    ])('%s = %d', (phrase, expected) => {
      expect(parseNumberWords(phrase)).toBe(expected);
    });

    it('is greedy but strict: "two ten" is two, then ten', () => {
      expect(parseCardinalAt(['two', 'ten'], 0)).toEqual({ value: 2, wordCount: 1 });
      expect(parseCardinalAt(['two', 'ten'], 1)).toEqual({ value: 10, wordCount: 1 });
      expect(parseNumberWords('two ten')).toBeNull();
    });

    it('reads a spoken year as two numbers, not one', () => {
      expect(parseCardinalAt(splitNumberWords('nineteen eighty-seven'), 0)).toEqual({ value: 19, wordCount: 1 });
    });

    it('does not swallow a dangling "and"', () => {
      expect(parseCardinalAt(['one', 'hundred', 'and', 'bolts'], 0)).toEqual({ value: 100, wordCount: 2 });
    });

    it('treats "a"/"an" as one only before hundred or thousand', () => {
      expect(parseCardinalAt(['a', 'bolt'], 0)).toBeNull();
      expect(parseCardinalAt(['an', 'inch'], 0)).toBeNull();
      expect(parseNumberWords('a')).toBe(1);
      expect(parseNumberWords('an')).toBe(1);
    });

    it('rejects words that are not numbers', () => {
      expect(parseNumberWords('bolts')).toBeNull();
      expect(parseNumberWords('')).toBeNull();
      expect(parseNumberWords('hundred')).toBeNull();
      expect(parseNumberWords('twenty zero')).toBeNull();
    });
  });

  describe('halves', () => {
    it.each([
      ['half', 0.5],
      ['a half', 0.5],
      ['one half', 0.5],
      ['one and a half', 1.5],
      ['twenty-two and a half', 22.5],
    ])('%s = %d', (phrase, expected) => {
      expect(parseNumberWords(phrase)).toBe(expected);
    });
  });

  describe('decimals spoken digit by digit', () => {
    it('keeps every spoken digit, trailing zeros included', () => {
      expect(parseSpokenDecimalAt(splitNumberWords('one point two five zero inches'), 0)).toEqual({
        integerPart: 1,
        fractionDigits: '250',
        wordCount: 5,
      });
    });

    it('reads "oh", "o" and "nought" as zero', () => {
      expect(parseSpokenDecimalAt(splitNumberWords('point oh one five'), 0)?.fractionDigits).toBe('015');
      expect(parseSpokenDecimalAt(splitNumberWords('point o o four'), 0)?.fractionDigits).toBe('004');
      expect(parseNumberWords('nought point nought five')).toBe(0.05);
      expect(digitWordValue('nought')).toBe(0);
    });

    it.each([
      ['one point two five zero', 1.25],
      ['point zero one five', 0.015],
      ['twelve point seven', 12.7],
      ['twenty-two point zero five', 22.05],
    ])('%s = %d', (phrase, expected) => {
      expect(parseNumberWords(phrase)).toBe(expected);
    });

    it('needs at least one digit after "point"', () => {
      expect(parseSpokenDecimalAt(['one', 'point', 'being'], 0)).toBeNull();
    });
  });

  describe('digit groups as read out in part numbers', () => {
    it.each([
      ['twenty-one', '21', 2],
      ['oh seven', '0', 1],
      ['seven', '7', 1],
      ['ten', '10', 1],
      ['twenty', '20', 1],
      ['twenty-one hundred', '2100', 3],
    ])('%s → %s', (phrase, digits, wordCount) => {
      expect(parseSpokenDigitGroupAt(splitNumberWords(phrase), 0)).toEqual({ digits, wordCount });
    });

    it('returns null for other words', () => {
      expect(parseSpokenDigitGroupAt(['bolt'], 0)).toBeNull();
    });
  });

  // Reference: the npm package words-to-numbers 1.5.1 (an independent implementation).
  describe('agrees with words-to-numbers on the phrases it covers', () => {
    it.each([
      'zero',
      'nineteen',
      'twenty two',
      'twenty-two',
      'ninety nine',
      'a hundred',
      'one hundred and five',
      'fifteen hundred',
      'eleven hundred',
      'a thousand',
      'one thousand and one',
      'two thousand three hundred and forty five',
      'twelve thousand five hundred',
      'seven hundred thousand',
      'one point two five zero',
      'point zero one five',
      'twelve point seven',
    ])('%s', (phrase) => {
      expect(parseNumberWords(phrase)).toBe(wordsToNumbers(phrase));
    });

    it('both leave a spoken year and "two ten" as separate numbers', () => {
      expect(wordsToNumbers('nineteen eighty seven')).toBe('19 87');
      expect(parseNumberWords('nineteen eighty seven')).toBeNull();
      expect(wordsToNumbers('two ten')).toBe('2 10');
      expect(parseNumberWords('two ten')).toBeNull();
    });

    it('differs on "twenty five hundred": the reference gives 520, spoken English means 2500', () => {
      expect(wordsToNumbers('twenty five hundred')).toBe(520);
      expect(parseNumberWords('twenty five hundred')).toBe(2500);
    });

    it('differs on "half": the reference leaves it as a word', () => {
      expect(wordsToNumbers('half')).toBe('half');
      expect(parseNumberWords('half')).toBe(0.5);
    });
  });
});
