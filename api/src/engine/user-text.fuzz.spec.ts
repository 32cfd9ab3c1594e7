import fc from 'fast-check';
import { GROWTH_ALLOWANCE, GROWTH_FACTOR, growthRatio, ignoringExpectedErrors } from '../testing/linear-time';
import { EngineError } from './engine-error';
import { fitLimits, parseToleranceClass } from './fits';
import { detectSafetyTopics } from './safety-topics';
import { parseSplinePitch } from './splines';
import { extractMeasurements, findPartNumbers } from './spoken-measurements';
import { parseTranscript, TranscriptParseError, type TranscriptFormat } from './transcript-formats';
import { parseLength } from './units';

/**
 * Property-based tests for every engine parser that reads user text. Each parser must:
 * - never crash: it returns, or throws the engine's own typed error (`EngineError`);
 * - name what was wrong: a transcript error names its line, a field parser quotes the text it refused;
 * - never hang: time grows linearly with the input, checked as a ratio (8× the input may take at most
 *   20× the time; quadratic work would take about 64×), never as an absolute time.
 * Run counts are bounded so the whole set stays within a few seconds.
 */

/* ---------------------------------------------------------------- generators */

/** Pieces that steer the parsers into their interesting paths; mixed with arbitrary text below. */
const TRICKY_PIECES = [
  ' ', '  ', '\t', '\n', '\n\n', '\r\n', '\u00a0', '\u2028', '-', '\u2011', '/', '.', ',', ':', '"', "'", '\u2033', '\u201c',
  '0', '1', '15', '3/8', '1.250', '.0004', 'e5', 'µ', 'μm', 'mm', 'in', 'inch', 'thou', 'tenths', 'thousandths', 'of', 'an', 'a',
  'and', 'half', 'quarter', 'point', 'one', 'twenty', 'hundred', 'thousand', 'millionths', 'HL', '2107', 'oh',
  'WEBVTT', '00:00:01.000', '-->', '00:01', '[00:01]', '01:02:03,004', 'NOTE', '<v Sam>', '</v>', '&amp;', '&#', '<', '>',
  'H7', 'g6', 'js', 'JS', 'dp', 'DP', 'm', 'module', '16/32', '\u{1d7d8}', '\u0301',
];

const piece = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...TRICKY_PIECES) },
  { weight: 1, arbitrary: fc.string({ unit: 'grapheme', maxLength: 6 }) },
);

const trickyText = (maxPieces: number) => fc.array(piece, { maxLength: maxPieces }).map((pieces) => pieces.join(''));

/** A shape grows in two ways: a middle piece stretched (one long run), or the whole pattern tiled. */
interface Shape {
  head: string;
  filler: string;
  tail: string;
  grow: 'stretch' | 'tile';
}

const shapes: fc.Arbitrary<Shape> = fc.record({
  head: trickyText(4),
  filler: trickyText(3).filter((text) => text.length > 0),
  tail: trickyText(4),
  grow: fc.constantFrom<Shape['grow']>('stretch', 'tile'),
});

/** About 2,000 characters at size 1; GROWTH_FACTOR times that at the large size. */
function grown(shape: Shape, factor: number): string {
  const unit = shape.grow === 'stretch' ? shape.filler : `${shape.head}${shape.filler}${shape.tail}`;
  const count = Math.ceil(2_000 / unit.length) * factor;
  return shape.grow === 'stretch' ? `${shape.head}${shape.filler.repeat(count)}${shape.tail}` : unit.repeat(count);
}

/** Inputs that once took quadratic time, or are the worst cases known for a parser; always tried first. */
const KNOWN_SHAPES: Shape[] = [
  { head: 'fifteen', filler: ' ', tail: '\n\nthou', grow: 'stretch' },
  { head: '1', filler: ' \t', tail: '\n \nmm', grow: 'stretch' },
  { head: '', filler: 'one ', tail: '', grow: 'stretch' },
  { head: '', filler: '1', tail: ' x', grow: 'stretch' },
  { head: '1', filler: ' ', tail: '2x', grow: 'stretch' },
  { head: 'WEBVTT\n\n00:00:01.000', filler: ' ', tail: '-->', grow: 'stretch' },
  { head: '1\n00:00:01,000 --> 00:00:02,000\n', filler: 'word ', tail: '', grow: 'stretch' },
  { head: '', filler: '[00:01] fifteen thou and a half\n', tail: '', grow: 'tile' },
];

/** Well-formed transcripts stretched, so the parsers read every line rather than stop at the first. */
const TRANSCRIPT_SHAPES: Shape[] = [
  { head: 'WEBVTT\n\n', filler: '00:00:01.000 --> 00:00:02.000\nfifteen thou\n\n', tail: '', grow: 'stretch' },
  { head: 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\n', filler: 'word ', tail: '\n', grow: 'stretch' },
  { head: 'WEBVTT', filler: '\n', tail: '00:00:01.000 --> 00:00:02.000\nx', grow: 'stretch' },
  { head: 'WEBVTT\n\n', filler: 'NOTE a b c\n\n', tail: '', grow: 'stretch' },
  { head: 'WEBVTT\n\n00:00:01.000 --> 00:00:02.000\n', filler: '<v Sam>&amp;', tail: '', grow: 'stretch' },
  { head: '', filler: '1\n00:00:01,000 --> 00:00:02,000\nthe bore\n\n', tail: '', grow: 'stretch' },
  { head: '', filler: '[00:01] a line of talk\n', tail: '', grow: 'stretch' },
  { head: '00:01 ', filler: ' ', tail: 'x', grow: 'stretch' },
];

function expectLinear(work: (input: string) => unknown, numRuns: number, knownShapes: Shape[] = []): void {
  fc.assert(
    fc.property(shapes, (shape) => {
      expect(growthRatio(work, grown(shape, 1), grown(shape, GROWTH_FACTOR))).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
    }),
    { numRuns, examples: [...KNOWN_SHAPES, ...knownShapes].map((shape) => [shape]) },
  );
}

const isEngineError = (error: unknown): boolean => error instanceof EngineError;

/* ---------------------------------------------------------------- transcripts */

const FORMATS: (TranscriptFormat | 'auto')[] = ['auto', 'webvtt', 'srt', 'timestamped'];

/** Line-based garbage with real cue syntax in it, so the parsers get past their first line. */
const transcriptLike = fc
  .tuple(
    fc.constantFrom('WEBVTT\n\n', '1\n', '', '[00:00] ', '\ufeffWEBVTT\n'),
    fc.array(fc.oneof(trickyText(6), fc.constant('00:00:01.000 --> 00:00:02.500'), fc.constant('')), { maxLength: 12 }),
  )
  .map(([start, lines]) => `${start}${lines.join('\n')}`);

describe('transcript formats under fuzzing', () => {
  it('parse or throw a TranscriptParseError naming a line of the input', () => {
    fc.assert(
      fc.property(fc.oneof(transcriptLike, fc.string({ unit: 'grapheme', maxLength: 200 })), fc.constantFrom(...FORMATS), (text, format) => {
        try {
          const { cues } = parseTranscript(text, format);
          for (const cue of cues) {
            expect(Number.isSafeInteger(cue.startMs) && Number.isSafeInteger(cue.endMs)).toBe(true);
            expect(cue.startMs).toBeGreaterThanOrEqual(0);
          }
        } catch (error) {
          expect(error).toBeInstanceOf(TranscriptParseError);
          const { line, message } = error as TranscriptParseError;
          expect(Number.isInteger(line) && line >= 1).toBe(true);
          expect(line).toBeLessThanOrEqual(text.split(/\r\n?|\n/u).length + 1);
          expect(message.startsWith(`Line ${line}: `)).toBe(true);
        }
      }),
      { numRuns: 400 },
    );
  });

  it.each(FORMATS)('take linear time (%s)', (format) => {
    expectLinear(ignoringExpectedErrors((text: string) => parseTranscript(text, format), isEngineError), 4, TRANSCRIPT_SHAPES);
  });
});

/* ---------------------------------------------------------------- lengths and units */

describe('written lengths under fuzzing', () => {
  it('parse to whole nanometres or throw a UnitError quoting the text', () => {
    fc.assert(
      fc.property(trickyText(6), fc.constantFrom(undefined, 'mm' as const, 'in' as const), (text, defaultUnit) => {
        try {
          expect(Number.isSafeInteger(parseLength(text, defaultUnit).nanometres)).toBe(true);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as EngineError).message).toContain(`"${text}"`);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('take linear time', () => {
    expectLinear(ignoringExpectedErrors((text: string) => parseLength(text, 'mm'), isEngineError), 6);
  });
});

/* ---------------------------------------------------------------- spoken measurements and part numbers */

describe('spoken measurements under fuzzing', () => {
  it('never throw; hits are in order, apart, slice back to their phrase and carry finite values', () => {
    fc.assert(
      fc.property(fc.oneof(trickyText(30), fc.string({ unit: 'grapheme', maxLength: 200 })), (text) => {
        let previousEnd = 0;
        for (const hit of extractMeasurements(text)) {
          expect(hit.start).toBeGreaterThanOrEqual(previousEnd);
          expect(text.slice(hit.start, hit.end)).toBe(hit.phrase);
          expect(Number.isFinite(hit.value) && Number.isFinite(hit.millimetres)).toBe(true);
          expect(['mm', 'um', 'in']).toContain(hit.unit);
          previousEnd = hit.end;
        }
      }),
      { numRuns: 500 },
    );
  });

  it('find part numbers without throwing, each mention slicing back to its phrase', () => {
    fc.assert(
      fc.property(trickyText(20), fc.array(trickyText(3), { maxLength: 4 }), (text, partNumbers) => {
        for (const mention of findPartNumbers(text, partNumbers)) {
          expect(text.slice(mention.start, mention.end)).toBe(mention.phrase);
          expect(partNumbers).toContain(mention.partNumber);
        }
      }),
      { numRuns: 300 },
    );
  });

  it('take linear time (measurements)', () => {
    expectLinear(extractMeasurements, 8);
  });

  it('take linear time (part numbers)', () => {
    expectLinear((text: string) => findPartNumbers(text, ['HL-2107', '4410', 'PB 6203']), 6);
  });
});

/* ---------------------------------------------------------------- tolerance classes and spline designations */

describe('tolerance classes and spline pitches under fuzzing', () => {
  it('tolerance classes parse or throw a FitError quoting the text', () => {
    fc.assert(
      fc.property(trickyText(4), (text) => {
        try {
          const parsed = parseToleranceClass(text);
          expect(parsed.text).toBe(text.trim());
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as EngineError).message).toContain(`"${text}"`);
        }
      }),
      { numRuns: 500 },
    );
  });

  it('fit limits answer finite numbers or throw an EngineError, for any size and class text', () => {
    fc.assert(
      fc.property(
        fc.oneof(fc.double(), fc.double({ min: 0.5, max: 600, noNaN: true })),
        fc.oneof(trickyText(3), fc.constantFrom('H7', 'JS7', 'K6', 'P9')),
        fc.oneof(trickyText(3), fc.constantFrom('g6', 'js6', 'h7', 'z11')),
        (sizeMm, hole, shaft) => {
          try {
            const limits = fitLimits({ sizeMm, hole, shaft });
            for (const value of [limits.hole.upper, limits.hole.lower, limits.shaft.upper, limits.shaft.lower]) {
              expect(Number.isFinite(value)).toBe(true);
            }
          } catch (error) {
            expect(error).toBeInstanceOf(EngineError);
          }
        },
      ),
      { numRuns: 500 },
    );
  });

  it('spline pitches parse or throw an EngineError quoting the text (or naming the length cap)', () => {
    fc.assert(
      fc.property(fc.oneof(trickyText(5), fc.string({ maxLength: 60 })), (text) => {
        try {
          const pitch = parseSplinePitch(text);
          const size = pitch.system === 'module' ? pitch.moduleMm : pitch.diametralPitch;
          expect(Number.isFinite(size)).toBe(true);
        } catch (error) {
          expect(error).toBeInstanceOf(EngineError);
          expect((error as EngineError).message).toMatch(text.length > 40 ? /at most 40 characters/ : new RegExp(`"${escapeRegExp(text)}"`));
        }
      }),
      { numRuns: 500 },
    );
  });

  it('take linear time (tolerance classes)', () => {
    expectLinear(ignoringExpectedErrors(parseToleranceClass, isEngineError), 4);
  });

  it('take linear time (spline pitches)', () => {
    expectLinear(ignoringExpectedErrors(parseSplinePitch, isEngineError), 4);
  });
});

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/gu, '\\$&');
}

/* ---------------------------------------------------------------- safety topics */

/** Near-misses for the topic patterns' look-behinds and optional words, stretched. */
const SAFETY_SHAPES: Shape[] = [
  { head: 'the ', filler: 'screwdriver ', tail: 'shaft', grow: 'stretch' },
  { head: '', filler: 'drive ', tail: 'shaf', grow: 'stretch' },
  { head: 'trailer', filler: ' ', tail: 'coupler of light', grow: 'stretch' },
  { head: '', filler: 'press the ', tail: 'bearin', grow: 'tile' },
  { head: '', filler: '1,', tail: ' rp', grow: 'stretch' },
];

describe('safety topic detection under fuzzing', () => {
  it('never throws and names only known topics', () => {
    fc.assert(
      fc.property(trickyText(40), (text) => {
        for (const topic of detectSafetyTopics(text)) expect(['lifting', 'rotating_parts', 'high_voltage', 'welding', 'pressing']).toContain(topic);
      }),
      { numRuns: 300 },
    );
  });

  it('takes linear time', () => {
    expectLinear(detectSafetyTopics, 6, SAFETY_SHAPES);
  });
});
