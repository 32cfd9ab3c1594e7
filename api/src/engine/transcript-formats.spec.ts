import fc from 'fast-check';
import { parseSync, type NodeCue } from 'subtitle';
import { EngineError } from './engine-error';
import {
  DEFAULT_LAST_CUE_MS,
  DEFAULT_MAX_CUES,
  TranscriptParseError,
  formatSrt,
  formatTimestamp,
  formatWebVtt,
  parseTranscript,
  type TranscriptCue,
} from './transcript-formats';

/** The error `parse` throws, for asserting on its line and message. */
function parseError(parse: () => unknown): TranscriptParseError {
  try {
    parse();
  } catch (error) {
    if (error instanceof TranscriptParseError) return error;
    throw error;
  }
  throw new Error('expected a TranscriptParseError');
}

const cue = (startMs: number, endMs: number, text: string, identifier?: string): TranscriptCue =>
  identifier === undefined ? { startMs, endMs, text } : { startMs, endMs, text, identifier };

describe('parseTranscript: WebVTT (W3C WebVTT, https://www.w3.org/TR/webvtt1/)', () => {
  const webVtt = (text: string): TranscriptCue[] => parseTranscript(text, 'webvtt').cues;

  it('WebVTT §1.1 "A simple caption file": voice spans removed, cue settings ignored', () => {
    const file = [
      'WEBVTT',
      '',
      '00:11.000 --> 00:13.000',
      '<v Roger Bingham>We are in New York City',
      '',
      '00:13.000 --> 00:16.000',
      "<v Roger Bingham>We're actually at the Lucern Hotel, just down the street",
      '',
      '00:30.000 --> 00:31.500 align:right size:50%',
      '<v Roger Bingham>When we e-mailed\u2014',
      '',
      '00:32.500 --> 00:33.500 align:left size:50%',
      '<v Neil deGrasse Tyson><i>Laughs</i>',
      '',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(11_000, 13_000, 'We are in New York City'),
      cue(13_000, 16_000, "We're actually at the Lucern Hotel, just down the street"),
      cue(30_000, 31_500, 'When we e-mailed\u2014'),
      cue(32_500, 33_500, 'Laughs'),
    ]);
  });

  it('WebVTT §1.2 "Caption cues with multiple lines": line breaks in the payload are kept', () => {
    const file = [
      'WEBVTT',
      '',
      '00:01.000 --> 00:04.000',
      'Never drink liquid nitrogen.',
      '',
      '00:05.000 --> 00:09.000',
      '\u2014 It will perforate your stomach.',
      '\u2014 You could die.',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(1000, 4000, 'Never drink liquid nitrogen.'),
      cue(5000, 9000, '\u2014 It will perforate your stomach.\n\u2014 You could die.'),
    ]);
  });

  it('WebVTT §1.3 "Styling captions": STYLE and NOTE blocks are skipped; bold markup removed', () => {
    const file = [
      'WEBVTT',
      '',
      'STYLE',
      '::cue {',
      '  background-image: linear-gradient(to bottom, dimgray, lightgray);',
      '  color: papayawhip;',
      '}',
      '/* Style blocks cannot use blank lines nor "dash dash greater than" */',
      '',
      'NOTE comment blocks can be used between style blocks.',
      '',
      'STYLE',
      '::cue(b) {',
      '  color: peachpuff;',
      '}',
      '',
      'hello',
      '00:00:00.000 --> 00:00:10.000',
      'Hello <b>world</b>.',
      '',
      'NOTE style blocks cannot appear after the first cue.',
    ].join('\n');
    expect(webVtt(file)).toEqual([cue(0, 10_000, 'Hello world.', 'hello')]);
  });

  it('WebVTT §1.4 "Other caption and subtitling features": cue identifiers', () => {
    const file = [
      'WEBVTT',
      '',
      'test',
      '00:00.000 --> 00:02.000',
      'This is a test.',
      '',
      '123',
      '00:00.000 --> 00:02.000',
      "That's an, an, that's an L!",
      '',
      'cr\u00e9dit de transcription',
      '00:04.000 --> 00:05.000',
      'Transcrit par C\u00e9lestes\u2122',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(0, 2000, 'This is a test.', 'test'),
      cue(0, 2000, "That's an, an, that's an L!", '123'),
      cue(4000, 5000, 'Transcrit par C\u00e9lestes\u2122', 'cr\u00e9dit de transcription'),
    ]);
  });

  it('WebVTT §1.4: class and language spans are removed, leaving the text', () => {
    const file = [
      'WEBVTT',
      '',
      '04:02.500 --> 04:05.000',
      "J'ai commenc\u00e9 le basket \u00e0 l'\u00e2ge de 13, 14 ans",
      '',
      '04:05.001 --> 04:07.800',
      'Sur les <i.foreignphrase><lang en>playground</lang></i>, ici \u00e0 Montpellier',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(242_500, 245_000, "J'ai commenc\u00e9 le basket \u00e0 l'\u00e2ge de 13, 14 ans"),
      cue(245_001, 247_800, 'Sur les playground, ici \u00e0 Montpellier'),
    ]);
  });

  it('WebVTT §1.4: REGION blocks are skipped and region/position settings ignored', () => {
    const file = [
      'WEBVTT',
      '',
      'REGION',
      'id:fred',
      'width:40%',
      'lines:3',
      'regionanchor:0%,100%',
      'viewportanchor:10%,90%',
      'scroll:up',
      '',
      '00:00:00.000 --> 00:00:20.000 region:fred align:left',
      '<v Fred>Hi, my name is Fred',
      '',
      '00:00:00.000 --> 00:00:04.000 position:10%,line-left align:left size:35%',
      'Where did he go?',
    ].join('\n');
    expect(webVtt(file)).toEqual([cue(0, 20_000, 'Hi, my name is Fred'), cue(0, 4000, 'Where did he go?')]);
  });

  it('WebVTT §1.5 "Comments in WebVTT": one-line and multi-line NOTE blocks are skipped', () => {
    const file = [
      'WEBVTT',
      '',
      'NOTE',
      'This file was written by Jill. I hope',
      'you enjoy reading it.',
      '',
      '00:01.000 --> 00:04.000',
      'Never drink liquid nitrogen.',
      '',
      'NOTE check next cue',
      '',
      '00:05.000 --> 00:09.000',
      '\u2014 It will perforate your stomach.',
      '',
      'NOTE end of file',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(1000, 4000, 'Never drink liquid nitrogen.'),
      cue(5000, 9000, '\u2014 It will perforate your stomach.'),
    ]);
  });

  it('WebVTT §1.6 "Chapters example": identifiers and hours', () => {
    const file = [
      'WEBVTT',
      '',
      'NOTE',
      'This is from a talk Silvia gave about WebVTT.',
      '',
      'Slide 1',
      '00:00:00.000 --> 00:00:10.700',
      'Title Slide',
      '',
      'Slide 4',
      '00:01:50.100 --> 00:03:33.000',
      'Requirements of a Video text format',
    ].join('\n');
    expect(webVtt(file)).toEqual([
      cue(0, 10_700, 'Title Slide', 'Slide 1'),
      cue(110_100, 213_000, 'Requirements of a Video text format', 'Slide 4'),
    ]);
  });

  it('WebVTT editor\'s draft "ATTRIBUTES" block is skipped', () => {
    const file = ['WEBVTT', '', 'ATTRIBUTES', 'kind: captions', 'lang: es-mx', '', '1', '00:00:10.123 --> 00:00:15.432', '\u00a1Hola!'].join('\n');
    expect(webVtt(file)).toEqual([cue(10_123, 15_432, '\u00a1Hola!', '1')]);
  });

  describe('WebVTT §4.1 "WebVTT file structure"', () => {
    it.each([
      ['"WEBVTT" alone', 'WEBVTT'],
      ['a space and a title', 'WEBVTT - This file has cues.'],
      ['a tab and a title', 'WEBVTT\tKind: captions'],
      ['a byte order mark first', '\uFEFFWEBVTT'],
    ])('accepts the signature line with %s', (_label, signature) => {
      expect(webVtt(`${signature}\n\n00:01.000 --> 00:02.000\nHi`)).toEqual([cue(1000, 2000, 'Hi')]);
    });

    it.each([
      ['another word run on', 'WEBVTTX'],
      ['lower case', 'webvtt'],
      ['a blank line first', '\nWEBVTT'],
    ])('rejects a signature with %s, on line 1', (_label, signature) => {
      const error = parseError(() => webVtt(`${signature}\n\n00:01.000 --> 00:02.000\nHi`));
      expect(error.line).toBe(1);
      expect(error.message).toMatch(/^Line 1: expected the WebVTT signature "WEBVTT"/);
    });

    it('accepts CRLF, CR and LF line terminators alike', () => {
      const lines = ['WEBVTT', '', '00:01.000 --> 00:02.000', 'one', 'two', '', '00:03.000 --> 00:04.000', 'three'];
      const expected = [cue(1000, 2000, 'one\ntwo'), cue(3000, 4000, 'three')];
      expect(webVtt(lines.join('\r\n'))).toEqual(expected);
      expect(webVtt(lines.join('\r'))).toEqual(expected);
      expect(webVtt(lines.join('\n'))).toEqual(expected);
    });

    it('ignores header lines after the signature up to the first blank line', () => {
      expect(webVtt('WEBVTT\nKind: captions\nLanguage: en\n\n00:01.000 --> 00:02.000\nHi')).toEqual([cue(1000, 2000, 'Hi')]);
    });

    it('reads a cue straight after the signature line (parser algorithm: "-->" ends the header)', () => {
      expect(webVtt('WEBVTT\n00:01.000 --> 00:02.000\nHi')).toEqual([cue(1000, 2000, 'Hi')]);
    });

    it('reads two cues without a blank line between them, as the parser algorithm does', () => {
      // WebVTT §2 "Conformance classes" example: "the parser will create two cues even if the blank line between them is skipped".
      expect(webVtt('WEBVTT\n\n00:01.000 --> 00:02.000\nA\n00:03.000 --> 00:04.000\nB')).toEqual([
        cue(1000, 2000, 'A'),
        cue(3000, 4000, 'B'),
      ]);
    });

    it('keeps a cue with an empty payload', () => {
      expect(webVtt('WEBVTT\n\n00:01.000 --> 00:02.000\n\n00:03.000 --> 00:04.000\nB')).toEqual([
        cue(1000, 2000, ''),
        cue(3000, 4000, 'B'),
      ]);
    });

    it('decodes character references in cue text (WebVTT cue text: HTML character references)', () => {
      expect(webVtt('WEBVTT\n\n00:01.000 --> 00:02.000\nFish &amp; chips &lt;3 &#x2014; &#8212; &nbsp;&copy2;')[0].text).toBe(
        'Fish & chips <3 \u2014 \u2014 \u00a0&copy2;',
      );
    });
  });

  describe('WebVTT §4.1 timestamps and "collect a WebVTT timestamp"', () => {
    const startOf = (timestamp: string): number =>
      webVtt(`WEBVTT\n\n${timestamp} --> 999:00:00.000\nx`)[0].startMs;

    it.each([
      ['00:00.000', 0],
      ['01:02.003', 62_003],
      ['59:59.999', 3_599_999],
      ['00:00:01.000', 1000],
      ['01:02:03.004', 3_723_004],
      ['1:02:03.004', 3_723_004], // the parser reads a one-digit first field as hours
      ['100:00:00.000', 360_000_000], // hours: two or more digits
    ])('%s is %d ms', (timestamp, ms) => {
      expect(startOf(timestamp)).toBe(ms);
    });

    it.each([
      ['minutes over 59', '00:60:00.000'],
      ['seconds over 59', '00:60.000'],
      ['a first field over 59 without hours', '60:00.000'],
      ['two-digit milliseconds', '00:01.00'],
      ['four-digit milliseconds', '00:01.0000'],
      ['a comma for the full stop', '00:01,000'],
      ['one-digit seconds', '00:1.000'],
    ])('rejects %s (%s)', (_label, timestamp) => {
      const error = parseError(() => startOf(timestamp));
      expect(error.line).toBe(3);
      expect(error.message).toContain('expected a cue timing like "00:00:01.000 --> 00:00:04.000"');
    });

    it('accepts tabs and extra spaces around the arrow (skip whitespace)', () => {
      expect(webVtt('WEBVTT\n\n00:01.000\t-->   00:02.000\nHi')).toEqual([cue(1000, 2000, 'Hi')]);
    });

    it('requires the end time to be after the start time (§4.1 cue timings)', () => {
      const error = parseError(() => webVtt('WEBVTT\n\n00:04.000 --> 00:04.000\nHi'));
      expect(error.line).toBe(3);
      expect(error.message).toBe('Line 3: the cue ends (00:00:04.000) before or when it starts (00:00:04.000)');
    });
  });

  describe('errors name the first bad line', () => {
    it('a timing line without a proper arrow', () => {
      const file = ['WEBVTT', '', '00:00:00.000 --> 00:00:01.000', 'First', '', '2', '00:00:01 -> 4', 'Second'].join('\n');
      const error = parseError(() => webVtt(file));
      expect(error).toBeInstanceOf(EngineError);
      expect(error.code).toBe('transcript_parse_error');
      expect(error.line).toBe(7);
      expect(error.message).toBe(
        'Line 7: expected a cue timing like "00:00:01.000 --> 00:00:04.000", found "00:00:01 -> 4"',
      );
    });

    it('a stray line of text between cues', () => {
      const error = parseError(() => webVtt('WEBVTT\n\n00:01.000 --> 00:02.000\nHi\n\nstray words'));
      expect(error.line).toBe(6);
      expect(error.message).toContain('found "stray words"');
    });

    it('a timing line that starts like a time but is broken', () => {
      const error = parseError(() => webVtt('WEBVTT\n\n00:01 00:02\nHi'));
      expect(error.line).toBe(3);
    });
  });
});

describe('parseTranscript: SubRip (SubRip format, as commonly documented; common practice)', () => {
  const srt = (text: string): TranscriptCue[] => parseTranscript(text, 'srt').cues;

  it('reads counters, comma timings, multi-line text and blank-line separation', () => {
    const file = [
      '1',
      '00:00:01,000 --> 00:00:04,000',
      'Coupler on the bench.',
      'Splines look clean.',
      '',
      '2',
      '00:00:04,500 --> 00:01:02,250',
      'Now the bore.',
      '',
    ].join('\r\n');
    expect(srt(file)).toEqual([
      cue(1000, 4000, 'Coupler on the bench.\nSplines look clean.'),
      cue(4500, 62_250, 'Now the bore.'),
    ]);
  });

  it('accepts "." as the millisecond separator (lenient)', () => {
    expect(srt('1\n00:00:01.000 --> 00:00:02.500\nHi')).toEqual([cue(1000, 2500, 'Hi')]);
  });

  it('ignores coordinates after the end time (common practice in some files)', () => {
    expect(srt('1\n00:00:01,000 --> 00:00:02,000 X1:40 X2:600 Y1:20 Y2:50\nHi')).toEqual([cue(1000, 2000, 'Hi')]);
  });

  it('keeps styling tags as written', () => {
    expect(srt('1\n00:00:01,000 --> 00:00:02,000\n<i>fifteen thou</i>')[0].text).toBe('<i>fifteen thou</i>');
  });

  it('tolerates a missing blank line before the next counter, and extra blank lines', () => {
    expect(srt('\n\n1\n00:00:01,000 --> 00:00:02,000\nA\n2\n00:00:03,000 --> 00:00:04,000\nB\n\n\n')).toEqual([
      cue(1000, 2000, 'A'),
      cue(3000, 4000, 'B'),
    ]);
  });

  it('tolerates a missing counter', () => {
    expect(srt('00:00:01,000 --> 00:00:02,000\nA')).toEqual([cue(1000, 2000, 'A')]);
  });

  it('reports a block that is neither a counter nor a timing', () => {
    const error = parseError(() => srt('1\n00:00:01,000 --> 00:00:02,000\nA\n\nB'));
    expect(error.line).toBe(5);
    expect(error.message).toBe('Line 5: expected a subtitle number such as "1", found "B"');
  });

  it.each([
    ['a missing arrow', '00:00:01,000 - 00:00:02,000'],
    ['minutes over 59', '00:61:01,000 --> 00:62:02,000'],
    ['two-digit milliseconds', '00:00:01,00 --> 00:00:02,000'],
  ])('reports a bad timing line: %s', (_label, timing) => {
    const error = parseError(() => srt(`1\n${timing}\nA`));
    expect(error.line).toBe(2);
    expect(error.message).toBe(
      `Line 2: expected a cue timing like "00:00:01,000 --> 00:00:04,000", found ${JSON.stringify(timing)}`,
    );
  });

  it('reports a counter at the end of the file', () => {
    expect(parseError(() => srt('1\n00:00:01,000 --> 00:00:02,000\nA\n\n2')).message).toBe(
      'Line 6: expected a cue timing like "00:00:01,000 --> 00:00:04,000", found the end of the file',
    );
  });

  it('requires the end time to be after the start time', () => {
    expect(parseError(() => srt('1\n00:00:05,000 --> 00:00:04,000\nA')).message).toBe(
      'Line 2: the cue ends (00:00:04,000) before or when it starts (00:00:05,000)',
    );
  });
});

describe('parseTranscript: timestamped lines', () => {
  const timestamped = (text: string, durationMs?: number): TranscriptCue[] =>
    parseTranscript(text, 'timestamped', { durationMs }).cues;

  it.each([
    ['[m:ss]', '[0:15] Coupler out of the box', 15_000],
    ['[mm:ss]', '[01:15] Coupler out of the box', 75_000],
    ['[h:mm:ss]', '[1:02:03] Coupler out of the box', 3_723_000],
    ['m:ss', '0:15 Coupler out of the box', 15_000],
    ['h:mm:ss', '1:02:03 Coupler out of the box', 3_723_000],
    ['(m:ss)', '(0:15) Coupler out of the box', 15_000],
    ['m:ss with a dash', '0:15 - Coupler out of the box', 15_000],
    ['m:ss.t', '0:15.5 Coupler out of the box', 15_500],
    ['minutes past 59 without hours', '75:10 Coupler out of the box', 4_510_000],
  ])('reads %s', (_label, line, startMs) => {
    expect(timestamped(line)[0]).toEqual(cue(startMs, startMs + DEFAULT_LAST_CUE_MS, 'Coupler out of the box'));
  });

  it('ends each cue at the next one and the last at the footage duration', () => {
    expect(timestamped('[0:00] Intro\n[0:15] Bore check\n[1:02] Spline count', 90_000)).toEqual([
      cue(0, 15_000, 'Intro'),
      cue(15_000, 62_000, 'Bore check'),
      cue(62_000, 90_000, 'Spline count'),
    ]);
  });

  it(`ends the last cue ${DEFAULT_LAST_CUE_MS} ms after it starts when no duration is given`, () => {
    expect(timestamped('[0:00] Intro\n[0:15] Bore check')[1]).toEqual(cue(15_000, 20_000, 'Bore check'));
  });

  it('continues the previous cue with lines that have no timestamp, skipping blank lines', () => {
    expect(timestamped('0:00 Intro\nstill the intro\n\n0:10 Next')).toEqual([
      cue(0, 10_000, 'Intro\nstill the intro'),
      cue(10_000, 15_000, 'Next'),
    ]);
  });

  it('joins a line with the same timestamp into the cue before it', () => {
    expect(timestamped('0:05 Sam: ready?\n0:05 Alex: go')).toEqual([cue(5000, 10_000, 'Sam: ready?\nAlex: go')]);
  });

  it('reports text before the first timestamp', () => {
    const error = parseError(() => timestamped('\nCoupler video\n0:00 Intro'));
    expect(error.line).toBe(2);
    expect(error.message).toBe(
      'Line 2: expected a line starting with a timestamp like "[0:15] text" or "1:02:03 text", found "Coupler video"',
    );
  });

  it('reports a timestamp that goes backwards', () => {
    expect(parseError(() => timestamped('0:30 A\n0:10 B')).message).toBe(
      'Line 2: timestamps must not go backwards: 00:00:10.000 comes after 00:00:30.000',
    );
  });

  it('reports seconds over 59, and minutes over 59 when hours are given', () => {
    expect(parseError(() => timestamped('0:75 A')).line).toBe(1);
    expect(parseError(() => timestamped('0:00 A\n1:75:00 B')).line).toBe(2);
  });

  it('reports a timestamp at or after the end of the footage', () => {
    expect(parseError(() => timestamped('0:00 A\n2:00 B', 120_000)).message).toBe(
      'Line 2: the timestamp 00:02:00.000 is at or after the end of the footage (00:02:00.000)',
    );
  });
});

describe('parseTranscript: format detection and limits', () => {
  it.each([
    ['WebVTT', 'WEBVTT\n\n00:01.000 --> 00:02.000\nHi', 'webvtt'],
    ['SubRip', '\n1\n00:00:01,000 --> 00:00:02,000\nHi', 'srt'],
    ['timestamped lines', '\n[0:01] Hi', 'timestamped'],
  ] as const)('detects %s', (_label, text, format) => {
    expect(parseTranscript(text, 'auto').format).toBe(format);
  });

  it('reports text it cannot place, on its line', () => {
    const error = parseError(() => parseTranscript('\n\nHello there', 'auto'));
    expect(error.line).toBe(3);
    expect(error.message).toMatch(/^Line 3: could not tell the transcript format/);
  });

  it('reports an empty transcript', () => {
    expect(parseError(() => parseTranscript(' \n\n', 'auto')).message).toBe('Line 1: the transcript is empty');
  });

  it(`refuses more than maxCues cues (default ${DEFAULT_MAX_CUES}), naming the first cue over the limit`, () => {
    const file = formatSrt([cue(0, 1000, 'a'), cue(1000, 2000, 'b'), cue(2000, 3000, 'c')]);
    expect(parseTranscript(file, 'srt', { maxCues: 3 }).cues).toHaveLength(3);
    const error = parseError(() => parseTranscript(file, 'srt', { maxCues: 2 }));
    expect(error.line).toBe(10);
    expect(error.message).toBe('Line 10: the transcript has more than 2 cues, the most accepted');
  });

  it('rejects options that are not positive whole numbers', () => {
    expect(() => parseTranscript('', 'srt', { maxCues: 0 })).toThrow(EngineError);
    expect(() => parseTranscript('', 'timestamped', { durationMs: 1.5 })).toThrow('durationMs must be a whole number');
  });
});

describe('formatting', () => {
  it.each([
    [0, 'webvtt', '00:00:00.000'],
    [3_723_004, 'webvtt', '01:02:03.004'],
    [3_723_004, 'srt', '01:02:03,004'],
    [360_000_000, 'webvtt', '100:00:00.000'],
  ] as const)('formatTimestamp(%d, %s) = %s', (ms, style, expected) => {
    expect(formatTimestamp(ms, style)).toBe(expected);
  });

  it('formatTimestamp refuses negative or fractional milliseconds', () => {
    expect(() => formatTimestamp(-1, 'srt')).toThrow(EngineError);
    expect(() => formatTimestamp(1.5, 'webvtt')).toThrow(EngineError);
  });

  it('formatWebVtt writes the signature, identifiers, timings and escaped text', () => {
    expect(formatWebVtt([cue(1000, 4000, 'Fish & chips\n<b>-->', 'intro'), cue(5000, 6000, '')])).toBe(
      'WEBVTT\n\nintro\n00:00:01.000 --> 00:00:04.000\nFish &amp; chips\n&lt;b&gt;--&gt;\n\n00:00:05.000 --> 00:00:06.000\n',
    );
  });

  it('formatSrt numbers the cues from 1 and drops blank lines inside text', () => {
    expect(formatSrt([cue(1000, 4000, 'one\n\ntwo'), cue(5000, 6000, 'three')])).toBe(
      '1\n00:00:01,000 --> 00:00:04,000\none\ntwo\n\n2\n00:00:05,000 --> 00:00:06,000\nthree\n\n',
    );
  });

  it('refuses cues WebVTT or SubRip cannot hold', () => {
    expect(() => formatSrt([cue(2000, 1000, 'x')])).toThrow('cue 1 ends (00:00:01,000) before or when it starts');
    expect(() => formatWebVtt([cue(0, 1000, 'x', 'a --> b')])).toThrow(EngineError);
  });

  describe('round trips (fast-check)', () => {
    // Weighted towards the characters that matter to the formats: markup, references, digits, dashes, spaces.
    const textUnit = fc.oneof(
      fc.constantFrom('&', '<', '>', ';', '#', 'amp', 'lt', '-', '->', ':', '.', ',', ' ', '\t', '0', '1', '9'),
      fc.string({ unit: 'grapheme-ascii', minLength: 1, maxLength: 1 }),
      fc.string({ unit: 'grapheme', minLength: 1, maxLength: 1 }),
    );
    const textLine = fc
      .string({ unit: textUnit, minLength: 1, maxLength: 30 })
      .filter((line) => line.trim() !== '' && !/[\r\n]|-->/u.test(line) && !line.includes('\u0000'));
    const arbitraryCues = (withIdentifiers: boolean): fc.Arbitrary<TranscriptCue[]> =>
      fc.array(
        fc
          .record({
            startMs: fc.nat({ max: 36_000_000 }),
            lengthMs: fc.integer({ min: 1, max: 600_000 }),
            lines: fc.array(textLine, { maxLength: 3 }),
            identifier: withIdentifiers ? fc.option(textLine, { nil: undefined }) : fc.constant(undefined),
          })
          .map(({ startMs, lengthMs, lines, identifier }) =>
            cue(startMs, startMs + lengthMs, lines.join('\n'), identifier),
          ),
        { maxLength: 12 },
      );

    it('formatWebVtt then parse gives the same cues', () => {
      fc.assert(
        fc.property(arbitraryCues(true), (cues) => {
          expect(parseTranscript(formatWebVtt(cues), 'auto')).toEqual({ format: 'webvtt', cues });
        }),
      );
    });

    it('formatSrt then parse gives the same cues', () => {
      fc.assert(
        fc.property(arbitraryCues(false).filter((cues) => cues.length > 0), (cues) => {
          expect(parseTranscript(formatSrt(cues), 'auto')).toEqual({ format: 'srt', cues });
        }),
      );
    });
  });
});

// Reference: the npm package subtitle 4.2.2 (parseSync), an independent SRT/WebVTT parser.
describe('cross-check against the subtitle package', () => {
  const referenceCues = (text: string): TranscriptCue[] =>
    parseSync(text)
      .filter((node): node is NodeCue => node.type === 'cue')
      .map(({ data }) => cue(data.start, data.end, data.text));

  const samples: [string, string][] = [
    [
      'SubRip with CRLF and multi-line cues',
      [
        '1',
        '00:00:00,500 --> 00:00:03,250',
        'Harrow Lane Garage, motor coupler build.',
        '',
        '2',
        '00:00:03,250 --> 00:00:07,000',
        'Bore is one point two five zero.',
        'Shaft is fifteen thousandths under.',
        '',
        '3',
        '01:02:03,004 --> 01:02:05,000',
        'Half a thou of runout.',
        '',
      ].join('\r\n'),
    ],
    [
      'WebVTT with a title, a comment and cue settings',
      [
        'WEBVTT - coupler test fit',
        '',
        'NOTE written for this test',
        '',
        '00:01.000 --> 00:04.000',
        'Twenty-two millimetre spigot.',
        '',
        '00:00:05.000 --> 00:00:09.500 align:left size:50%',
        'Three eighths of an inch',
        'of plunge left.',
        '',
      ].join('\n'),
    ],
    [
      'WebVTT with numeric identifiers',
      ['WEBVTT', '', '1', '00:00:01.000 --> 00:00:02.000', 'One', '', '2', '00:00:02.000 --> 00:00:03.000', 'Two', ''].join(
        '\n',
      ),
    ],
  ];

  it.each(samples)('%s: same cue times and texts', (_label, text) => {
    const ours = parseTranscript(text, 'auto').cues.map(({ startMs, endMs, text: cueText }) => cue(startMs, endMs, cueText));
    expect(ours).toEqual(referenceCues(text));
  });

  describe('where the reference differs (documented, not followed)', () => {
    it('it rejects non-numeric WebVTT cue identifiers, which WebVTT §1.4 allows', () => {
      const text = 'WEBVTT\n\ntest\n00:00.000 --> 00:02.000\nThis is a test.\n';
      expect(() => parseSync(text)).toThrow();
      expect(parseTranscript(text, 'webvtt').cues).toEqual([cue(0, 2000, 'This is a test.', 'test')]);
    });

    it('it reads ",5" as 5 ms; we require three millisecond digits', () => {
      const text = '1\n00:00:01,5 --> 00:00:02,000\nx\n';
      expect(referenceCues(text)).toEqual([cue(1005, 2000, 'x')]);
      expect(parseError(() => parseTranscript(text, 'srt')).line).toBe(2);
    });

    it('it does not treat a lone CR as a line terminator; WebVTT does', () => {
      const text = 'WEBVTT\r\r00:01.000 --> 00:04.000\rA\r';
      expect(referenceCues(text)).toEqual([]);
      expect(parseTranscript(text, 'webvtt').cues).toEqual([cue(1000, 4000, 'A')]);
    });

    it('it keeps a blank line inside a SubRip cue; we end the cue there and report the stray text', () => {
      const text = '1\n00:00:01,000 --> 00:00:02,000\nline\n\nafter blank\n';
      expect(referenceCues(text)).toEqual([cue(1000, 2000, 'line\n\nafter blank')]);
      expect(parseError(() => parseTranscript(text, 'srt')).line).toBe(5);
    });
  });
});
