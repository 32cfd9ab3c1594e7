import fc from 'fast-check';
import { toWords } from 'number-to-words';
import wordsToNumbers from 'words-to-numbers';
import { extractMeasurements, extractMeasurementsInSlices, findPartNumbers, type SpokenMeasurement } from './spoken-measurements';

/** Written for these tests (an invented bench session); not taken from any real video. */
const BENCH_TALK = [
  'Right, this is the HL-2107 coupler on the bench.',
  'I measured the bore at one point two five zero inches, and the shaft is fifteen thousandths of an inch under that.',
  'On the metric side the spigot is 22 mm, so twenty-two millimetres, give or take half a thou.',
  'Runout was about four tenths, call it .0004", which is fine for a 21-tooth spline.',
  'The adapter plate wants 3/8 inch bolts, four bolts in all, and the pilot bearing sits 1 3/8 in deep.',
  'Two couplers came in the box; the other one, h l twenty-one oh eight, is a quarter inch longer.',
  'We started at 3:15 and the truck is a 1987 pickup, so call 555-0147 if the two of us are late.',
].join('\n');

type Expected = Pick<SpokenMeasurement, 'phrase' | 'value' | 'unit' | 'millimetres'>;

function summary(measurements: SpokenMeasurement[]): Expected[] {
  return measurements.map(({ phrase, value, unit, millimetres }) => ({ phrase, value, unit, millimetres }));
}

function only(text: string): Expected {
  const found = extractMeasurements(text);
  expect(found).toHaveLength(1);
  return summary(found)[0];
}

describe('extractMeasurements', () => {
  describe('on an invented bench session', () => {
    const found = extractMeasurements(BENCH_TALK);

    it('finds every spoken and written length, in order', () => {
      expect(summary(found)).toEqual([
        { phrase: 'one point two five zero inches', value: 1.25, unit: 'in', millimetres: 31.75 },
        { phrase: 'fifteen thousandths of an inch', value: 0.015, unit: 'in', millimetres: 0.381 },
        { phrase: '22 mm', value: 22, unit: 'mm', millimetres: 22 },
        { phrase: 'twenty-two millimetres', value: 22, unit: 'mm', millimetres: 22 },
        { phrase: 'half a thou', value: 0.0005, unit: 'in', millimetres: 0.0127 },
        { phrase: 'four tenths', value: 0.0004, unit: 'in', millimetres: 0.01016 },
        { phrase: '.0004"', value: 0.0004, unit: 'in', millimetres: 0.01016 },
        { phrase: '3/8 inch', value: 0.375, unit: 'in', millimetres: 9.525 },
        { phrase: '1 3/8 in', value: 1.375, unit: 'in', millimetres: 34.925 },
        { phrase: 'a quarter inch', value: 0.25, unit: 'in', millimetres: 6.35 },
      ]);
    });

    it('gives character offsets that slice back to the phrase', () => {
      for (const hit of found) {
        expect(BENCH_TALK.slice(hit.start, hit.end)).toBe(hit.phrase);
        expect(hit.start).toBe(BENCH_TALK.indexOf(hit.phrase));
      }
    });

    it('finds the part numbers said in it, written or spoken', () => {
      expect(findPartNumbers(BENCH_TALK, ['HL-2107', 'HL-2108', 'PB-6203'])).toEqual([
        { partNumber: 'HL-2107', phrase: 'HL-2107', start: BENCH_TALK.indexOf('HL-2107'), end: BENCH_TALK.indexOf('HL-2107') + 7 },
        {
          partNumber: 'HL-2108',
          phrase: 'h l twenty-one oh eight',
          start: BENCH_TALK.indexOf('h l twenty'),
          end: BENCH_TALK.indexOf('h l twenty') + 'h l twenty-one oh eight'.length,
        },
      ]);
    });
  });

  describe('digits with a unit', () => {
    it.each<[string, Expected]>([
      ['1.250 inch', { phrase: '1.250 inch', value: 1.25, unit: 'in', millimetres: 31.75 }],
      ['0.015"', { phrase: '0.015"', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['0.015\u2033', { phrase: '0.015\u2033', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['22 mm', { phrase: '22 mm', value: 22, unit: 'mm', millimetres: 22 }],
      ['22mm', { phrase: '22mm', value: 22, unit: 'mm', millimetres: 22 }],
      ['(22.5 millimeters)', { phrase: '22.5 millimeters', value: 22.5, unit: 'mm', millimetres: 22.5 }],
      ['15 thou', { phrase: '15 thou', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['15 thousandths', { phrase: '15 thousandths', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['5 mil film', { phrase: '5 mil', value: 0.005, unit: 'in', millimetres: 0.127 }],
      ['4 tenths', { phrase: '4 tenths', value: 0.0004, unit: 'in', millimetres: 0.01016 }],
      ['.0004 in', { phrase: '.0004 in', value: 0.0004, unit: 'in', millimetres: 0.01016 }],
      ['3/8 inch', { phrase: '3/8 inch', value: 0.375, unit: 'in', millimetres: 9.525 }],
      ['3/8 of an inch', { phrase: '3/8 of an inch', value: 0.375, unit: 'in', millimetres: 9.525 }],
      ['1 3/8 in', { phrase: '1 3/8 in', value: 1.375, unit: 'in', millimetres: 34.925 }],
      ['1-3/8"', { phrase: '1-3/8"', value: 1.375, unit: 'in', millimetres: 34.925 }],
      ['12 microns', { phrase: '12 microns', value: 12, unit: 'um', millimetres: 0.012 }],
      ['12 \u00b5m', { phrase: '12 \u00b5m', value: 12, unit: 'um', millimetres: 0.012 }],
      ['12 \u03bcm', { phrase: '12 \u03bcm', value: 12, unit: 'um', millimetres: 0.012 }],
      ['12um', { phrase: '12um', value: 12, unit: 'um', millimetres: 0.012 }],
      ['8 micrometres', { phrase: '8 micrometres', value: 8, unit: 'um', millimetres: 0.008 }],
    ])('%s', (text, expected) => {
      expect(only(text)).toEqual(expected);
    });
  });

  describe('words', () => {
    it.each<[string, Expected]>([
      ['fifteen thousandths of an inch', { phrase: 'fifteen thousandths of an inch', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['fifteen thou', { phrase: 'fifteen thou', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['a thou', { phrase: 'a thou', value: 0.001, unit: 'in', millimetres: 0.0254 }],
      ['twenty-two millimetres', { phrase: 'twenty-two millimetres', value: 22, unit: 'mm', millimetres: 22 }],
      ['twenty two millimeters', { phrase: 'twenty two millimeters', value: 22, unit: 'mm', millimetres: 22 }],
      ['three mil', { phrase: 'three mil', value: 0.003, unit: 'in', millimetres: 0.0762 }],
      ['half a thou', { phrase: 'half a thou', value: 0.0005, unit: 'in', millimetres: 0.0127 }],
      ['half a tenth', { phrase: 'half a tenth', value: 0.00005, unit: 'in', millimetres: 0.00127 }],
      ['a tenth', { phrase: 'a tenth', value: 0.0001, unit: 'in', millimetres: 0.00254 }],
      ['four tenths', { phrase: 'four tenths', value: 0.0004, unit: 'in', millimetres: 0.01016 }],
      ['two ten-thousandths', { phrase: 'two ten-thousandths', value: 0.0002, unit: 'in', millimetres: 0.00508 }],
      ['ten thousandths', { phrase: 'ten thousandths', value: 0.01, unit: 'in', millimetres: 0.254 }],
      ['one point two five zero inches', { phrase: 'one point two five zero inches', value: 1.25, unit: 'in', millimetres: 31.75 }],
      ['point zero one five inch', { phrase: 'point zero one five inch', value: 0.015, unit: 'in', millimetres: 0.381 }],
      ['point five thou', { phrase: 'point five thou', value: 0.0005, unit: 'in', millimetres: 0.0127 }],
      ['twelve point seven millimetres', { phrase: 'twelve point seven millimetres', value: 12.7, unit: 'mm', millimetres: 12.7 }],
      ['three eighths of an inch', { phrase: 'three eighths of an inch', value: 0.375, unit: 'in', millimetres: 9.525 }],
      ['three-eighths inch', { phrase: 'three-eighths inch', value: 0.375, unit: 'in', millimetres: 9.525 }],
      ['five sixteenths', { phrase: 'five sixteenths', value: 0.3125, unit: 'in', millimetres: 7.9375 }],
      ['three sixty-fourths', { phrase: 'three sixty-fourths', value: 0.046875, unit: 'in', millimetres: 1.190625 }],
      ['five thirty-seconds of an inch', { phrase: 'five thirty-seconds of an inch', value: 0.15625, unit: 'in', millimetres: 3.96875 }],
      ['a quarter inch', { phrase: 'a quarter inch', value: 0.25, unit: 'in', millimetres: 6.35 }],
      ['quarter inch drive', { phrase: 'quarter inch', value: 0.25, unit: 'in', millimetres: 6.35 }],
      ['half an inch', { phrase: 'half an inch', value: 0.5, unit: 'in', millimetres: 12.7 }],
      ['an inch and a half', { phrase: 'an inch and a half', value: 1.5, unit: 'in', millimetres: 38.1 }],
      ['one and a half inches', { phrase: 'one and a half inches', value: 1.5, unit: 'in', millimetres: 38.1 }],
      ['two and three quarter inches', { phrase: 'two and three quarter inches', value: 2.75, unit: 'in', millimetres: 69.85 }],
      ['a tenth of a millimetre', { phrase: 'a tenth of a millimetre', value: 0.1, unit: 'mm', millimetres: 0.1 }],
      ['five hundredths of a millimetre', { phrase: 'five hundredths of a millimetre', value: 0.05, unit: 'mm', millimetres: 0.05 }],
      ['a tenth of an inch', { phrase: 'a tenth of an inch', value: 0.1, unit: 'in', millimetres: 2.54 }],
      ['eight microns', { phrase: 'eight microns', value: 8, unit: 'um', millimetres: 0.008 }],
      ['a micron', { phrase: 'a micron', value: 1, unit: 'um', millimetres: 0.001 }],
      ['a third of an inch', { phrase: 'a third of an inch', value: 0.333333333, unit: 'in', millimetres: 8.466667 }],
    ])('%s', (text, expected) => {
      expect(only(text)).toEqual(expected);
    });

    it('reads across a line break inside a cue', () => {
      expect(only('fifteen\nthou').phrase).toBe('fifteen\nthou');
    });

    it('does not read across a blank line', () => {
      expect(extractMeasurements('fifteen\n\nthou')).toEqual([]);
    });
  });

  describe('readings said in two parts (coarse, then finer) are one measurement', () => {
    // Shop usage (common practice, from memory): "a thou and two tenths" is 0.0012 in; "an inch and a
    // quarter" is 1.25 in; "millionths" are microinches. Sentences written for these tests.
    it.each<[string, Expected]>([
      ['it came in at one thousandth and two tenths over', { phrase: 'one thousandth and two tenths', value: 0.0012, unit: 'in', millimetres: 0.03048 }],
      ['cut it an inch and a quarter long', { phrase: 'an inch and a quarter', value: 1.25, unit: 'in', millimetres: 31.75 }],
      ['the stub is two inches and fifteen thousandths', { phrase: 'two inches and fifteen thousandths', value: 2.015, unit: 'in', millimetres: 51.181 }],
      ['runout was three thou and a half, too much', { phrase: 'three thou and a half', value: 0.0035, unit: 'in', millimetres: 0.0889 }],
      ['fifteen thou and two tenths, no more', { phrase: 'fifteen thou and two tenths', value: 0.0152, unit: 'in', millimetres: 0.38608 }],
      ['a tenth and a half, end to end', { phrase: 'a tenth and a half', value: 0.00015, unit: 'in', millimetres: 0.00381 }],
      ['two inches and three eighths overall', { phrase: 'two inches and three eighths', value: 2.375, unit: 'in', millimetres: 60.325 }],
      ['the bore reads 1.250 inch and two tenths', { phrase: '1.250 inch and two tenths', value: 1.2502, unit: 'in', millimetres: 31.75508 }],
      ['half a thou and a tenth is the limit', { phrase: 'half a thou and a tenth', value: 0.0006, unit: 'in', millimetres: 0.01524 }],
      ['twenty-two millimetres and a half', { phrase: 'twenty-two millimetres and a half', value: 22.5, unit: 'mm', millimetres: 22.5 }],
      ['an inch and five thirty-seconds', { phrase: 'an inch and five thirty-seconds', value: 1.15625, unit: 'in', millimetres: 29.36875 }],
    ])('%s', (text, expected) => {
      expect(only(text)).toEqual(expected);
    });

    it.each<[string, Expected]>([
      ['the finish is fifty millionths of an inch', { phrase: 'fifty millionths of an inch', value: 0.00005, unit: 'in', millimetres: 0.00127 }],
      ['flat to fifty millionths', { phrase: 'fifty millionths', value: 0.00005, unit: 'in', millimetres: 0.00127 }],
      ['a millionth of an inch', { phrase: 'a millionth of an inch', value: 0.000001, unit: 'in', millimetres: 0.000025 }],
      ['sixteen microinches Ra', { phrase: 'sixteen microinches', value: 0.000016, unit: 'in', millimetres: 0.000406 }],
    ])('millionths of an inch are a unit: %s', (text, expected) => {
      expect(only(text)).toEqual(expected);
    });

    it('keeps the phrase span over both parts, in a longer sentence', () => {
      const text = 'Okay, so the shaft is two inches and fifteen thousandths, and the bore is 22 mm.';
      const [first, second] = extractMeasurements(text);
      expect(text.slice(first.start, first.end)).toBe('two inches and fifteen thousandths');
      expect(first.start).toBe(text.indexOf('two inches'));
      expect(second.phrase).toBe('22 mm');
    });

    it.each([
      ['a larger second part', 'two inches and three inches', ['two inches', 'three inches']],
      ['another unit system', '15 thou and 22 mm', ['15 thou', '22 mm']],
      ['a count of parts after "and"', 'an inch and two bolts', ['an inch']],
      ['a fraction of something else', 'one inch and a quarter of the way', ['one inch']],
      ['a time after "and"', 'it was 2 inches and 3:15 later', ['2 inches']],
      ['a part number after "and"', 'a thou and HL-2107', ['a thou']],
      ['a blank line between the parts', 'two inches and\n\nfifteen thousandths', ['two inches', 'fifteen thousandths']],
    ])('stays apart with %s: %s', (_label, text, phrases) => {
      expect(extractMeasurements(text).map((hit) => hit.phrase)).toEqual(phrases);
    });
  });

  describe('round trips through number words from npm (number-to-words 1.2.4, checked with words-to-numbers 1.5.1)', () => {
    /** number-to-words writes "one thousand, two hundred"; nobody says the comma. */
    const spoken = (value: number): string => toWords(value).replace(/,/g, '');

    it('reads "<n> thousandths" as n/1000 in', () => {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 999_999 }), (count) => {
          expect(only(`that is ${spoken(count)} thousandths over`).value).toBe(Number(`${count}e-3`));
        }),
        { numRuns: 200 },
      );
    });

    it('agrees with words-to-numbers below a thousand (above, 1.5.1 reads "twenty-one thousand" as 1020)', () => {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 999 }), (count) => {
          const words = spoken(count);
          expect(wordsToNumbers(words)).toBe(count);
          expect(only(`${words} thou`).value).toBe(Number(`${count}e-3`));
        }),
        { numRuns: 200 },
      );
    });

    it('reads "<a> thousandths and <b> tenths" as one reading of a·10 + b tenths', () => {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 999 }), fc.integer({ min: 1, max: 9 }), (thousandths, tenths) => {
          const text = `about ${spoken(thousandths)} thousandths and ${spoken(tenths)} tenths`;
          const hit = only(text);
          expect(hit.phrase).toBe(text.slice('about '.length));
          expect(hit.value).toBe(Number(`${thousandths * 10 + tenths}e-4`));
        }),
        { numRuns: 200 },
      );
    });

    it('reads "<w> inches and <t> thousandths" as w + t/1000 in', () => {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 99 }), fc.integer({ min: 1, max: 999 }), (inches, thousandths) => {
          const hit = only(`${spoken(inches)} inches and ${spoken(thousandths)} thousandths`);
          expect(hit.value).toBe(Number(`${inches * 1000 + thousandths}e-3`));
          expect(hit.unit).toBe('in');
        }),
        { numRuns: 200 },
      );
    });
  });

  describe('things that are not measurements', () => {
    it.each([
      ['people', 'the two of us'],
      ['a rate', 'open 24/7'],
      ['a year', 'a 1987 pickup'],
      ['part counts', 'four bolts and two couplers'],
      ['a time of day', 'at 3:15 in the shop'],
      ['a phone number', 'call 555-0147 or 555 0147'],
      ['a date', 'on 3/8/2024'],
      ['a bare number', '.0004'],
      ['a decimal read out without a unit', 'one point two five zero'],
      ['an amount without a unit', 'fifteen thousand'],
      ['the instrument', 'grab a micrometer'],
      ['a filler "um"', 'it was 22 um maybe 23'],
      ['"in" after a whole number', 'put 3 in the vise'],
      ['a fraction of time', 'a tenth of a second'],
      ['a fraction of something else', 'a quarter of the way'],
      ['time in seconds', 'give it thirty seconds, then a thirty-second soak'],
      ['a half on its own', 'half the time'],
      ['a number inside a part number', 'the HL2107 mm'],
      ['a quoted number', 'he wrote "15" on it'],
      ['a spline count', 'a 21-tooth spline'],
      ['archaic "thou"', 'thou shalt measure twice'],
      ['a quoted article', 'say "a" twice'],
      ['a run of digits longer than any reading', 'serial 12345678901234567 mm'],
    ])('%s: %s', (_label, text) => {
      expect(extractMeasurements(text)).toEqual([]);
    });
  });

  describe('in slices', () => {
    it('gives the same measurements as one call, in slices of bounded work', () => {
      const text = `${BENCH_TALK}\n`.repeat(200);
      const slices = extractMeasurementsInSlices(text);
      let sliceCount = 1;
      let slice = slices.next();
      while (!slice.done) {
        sliceCount += 1;
        slice = slices.next();
      }
      expect(slice.value.measurements).toEqual(extractMeasurements(text));
      expect(slice.value).toMatchObject({ total: 2_000, measurements: expect.any(Array) });
      expect(slice.value.measurements).toHaveLength(2_000);
      // About 80,000 characters and 16,000 tokens: several slices, each a few thousand characters or a thousand tokens.
      expect(sliceCount).toBeGreaterThan(text.length / 4_096);
    });

    it('builds at most `limit` measurements and counts the rest', () => {
      const text = `${BENCH_TALK}\n`.repeat(30);
      const all = extractMeasurements(text);
      const slices = extractMeasurementsInSlices(text, { limit: 25 });
      let slice = slices.next();
      while (!slice.done) slice = slices.next();
      expect(slice.value.total).toBe(all.length);
      expect(slice.value.measurements).toEqual(all.slice(0, 25));
    });
  });

  describe('properties', () => {
    it('never throws, and every hit slices back to its phrase', () => {
      fc.assert(
        fc.property(fc.string({ unit: 'grapheme', maxLength: 120 }), (text) => {
          for (const hit of extractMeasurements(text)) {
            expect(text.slice(hit.start, hit.end)).toBe(hit.phrase);
          }
        }),
      );
    });

    it('reads any written decimal with a unit exactly, without float drift', () => {
      fc.assert(
        fc.property(
          fc.nat({ max: 999 }),
          fc.stringMatching(/^[0-9]{1,4}$/),
          fc.constantFrom('mm', 'inch', 'thou'),
          (whole, decimals, unit) => {
            const written = `${whole}.${decimals}`;
            const [hit] = extractMeasurements(`about ${written} ${unit} or so`);
            const expectedValue = unit === 'thou' ? Number(`${whole}.${decimals}e-3`) : Number(written);
            expect(hit.value).toBe(expectedValue);
          },
        ),
      );
    });
  });
});

describe('findPartNumbers', () => {
  const parts = ['HL-2107', '4410', 'PB-6203'];

  it.each([
    ['HL-2107', 'HL-2107'],
    ['HL 2107', 'HL 2107'],
    ['the hl2107 coupler', 'hl2107'],
    ['H.L.-2107.', 'H.L.-2107'],
    ['H L twenty-one oh seven', 'H L twenty-one oh seven'],
    ['HL twenty one zero seven', 'HL twenty one zero seven'],
    ["the hl-2107's bore", 'hl-2107'],
    ['PB sixty-two oh three', 'PB sixty-two oh three'],
    ['part 44 10', '44 10'],
    ['forty-four ten', 'forty-four ten'],
  ])('finds %s', (text, phrase) => {
    const [mention] = findPartNumbers(text, parts);
    expect(mention.phrase).toBe(phrase);
    expect(text.slice(mention.start, mention.end)).toBe(phrase);
  });

  it.each([
    ['letters missing', 'twenty one oh seven'],
    ['letters run on', 'xhl2107'],
    ['another suffix', 'HL-2107B'],
    ['more digits', '44100 and 21070'],
    ['a longer spoken number', 'HL twenty-one oh seven five'],
  ])('does not match when %s: %s', (_label, text) => {
    expect(findPartNumbers(text, parts)).toEqual([]);
  });

  it('needs four digits for a digits-only part number, and three characters otherwise', () => {
    expect(findPartNumbers('12 bolts and part 123', ['12', '123'])).toEqual([]);
    expect(findPartNumbers('a one inch bolt', ['A1'])).toEqual([]);
    expect(findPartNumbers('part 2107', ['2107'])).toEqual([{ partNumber: '2107', phrase: '2107', start: 5, end: 9 }]);
  });

  it('keeps the longer mention where two part numbers overlap', () => {
    expect(findPartNumbers('HL-2107 fits', ['2107', 'HL-2107'])).toEqual([
      { partNumber: 'HL-2107', phrase: 'HL-2107', start: 0, end: 7 },
    ]);
  });

  it('finds every mention, in text order', () => {
    const text = '4410 first, then HL-2107, then 4410 again';
    expect(findPartNumbers(text, parts).map((mention) => [mention.partNumber, mention.start])).toEqual([
      ['4410', 0],
      ['HL-2107', 17],
      ['4410', 31],
    ]);
  });
});
