import fc from 'fast-check';
import { GROWTH_ALLOWANCE, GROWTH_FACTOR, growthRatio, ignoringExpectedErrors } from '../testing/linear-time';
import { EngineError } from './engine-error';
import { readFinderLength, readFinderPitch } from './fit-finder';

/** Text a reader might type into the finder's size and pitch fields, and some that no one would. */
const lengthLike = fc.oneof(
  fc.tuple(fc.stringMatching(/^[0-9]{0,4}(\.[0-9]{0,6})?$/), fc.constantFrom('', ' mm', ' in', '"', ' thou', ' tenths', 'µm', ' inch')).map(([number, unit]) => `${number}${unit}`),
  fc.string({ unit: 'grapheme', maxLength: 60 }),
);
const pitchLike = fc.oneof(fc.constantFrom('16/32', '20 DP', 'm1.25', 'module 2', '24/48dp'), fc.string({ unit: 'grapheme', maxLength: 60 }));

describe('fit finder readers under fuzzing', () => {
  it('read a length exactly or refuse with an EngineError naming the field', () => {
    fc.assert(
      fc.property(lengthLike, fc.constantFrom(undefined, 'mm' as const, 'in' as const), (text, unit) => {
        try {
          const { nm } = readFinderLength('diameter', text, unit);
          expect(Number.isSafeInteger(nm) && nm > 0).toBe(true);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as Error).message.startsWith('diameter')).toBe(true);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('read a pitch or refuse with an EngineError naming the field', () => {
    fc.assert(
      fc.property(pitchLike, (text) => {
        try {
          readFinderPitch('splinePitch', text);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as Error).message.startsWith('splinePitch: ')).toBe(true);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('take linear time on long hostile input (8× the text within 20× the time)', () => {
    const small = '1'.repeat(500) + '.' + '9'.repeat(500) + ' x';
    const large = '1'.repeat(500 * GROWTH_FACTOR) + '.' + '9'.repeat(500 * GROWTH_FACTOR) + ' x';
    const work = ignoringExpectedErrors((text: string) => readFinderLength('diameter', text, 'mm'), (error) => error instanceof EngineError);
    expect(growthRatio(work, small, large)).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
  });
});
