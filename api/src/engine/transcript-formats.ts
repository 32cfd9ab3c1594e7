import { EngineError } from './engine-error';

/**
 * Transcript files: WebVTT (W3C, https://www.w3.org/TR/webvtt1/), SubRip (.srt, no formal
 * standard; common practice) and plain timestamped lines ("[1:02] text").
 *
 * Parsing is line-based and reports the first bad line, because a creator fixing a transcript
 * needs to know where to look. Where the WebVTT parsing algorithm would silently drop a
 * malformed block, we report it instead; everything the algorithm accepts from a valid file
 * we accept the same way.
 */

export type TranscriptFormat = 'webvtt' | 'srt' | 'timestamped';

export interface TranscriptCue {
  startMs: number;
  endMs: number;
  /**
   * Plain text, lines joined with "\n". WebVTT markup is removed and character references are
   * decoded ("<v Sam>Fish &amp; chips" → "Fish & chips"); SubRip text is kept as written.
   */
  text: string;
  /** The WebVTT cue identifier, when the file gave one. */
  identifier?: string;
}

export interface ParsedTranscript {
  format: TranscriptFormat;
  cues: TranscriptCue[];
}

export interface ParseTranscriptOptions {
  /** Footage length: the end of the last timestamped line, and a bound on its timestamps. */
  durationMs?: number;
  /** Refuse transcripts with more cues than this (default `DEFAULT_MAX_CUES`). */
  maxCues?: number;
}

/** About 11 hours of two-second cues; far beyond any workshop video, small enough to hold in memory. */
export const DEFAULT_MAX_CUES = 20_000;

/** Timestamped lines give only start times; without the footage's duration the last cue lasts this long. */
export const DEFAULT_LAST_CUE_MS = 5_000;

/** A transcript the parser cannot accept; `line` is 1-based and the message starts "Line N: ". */
export class TranscriptParseError extends EngineError {
  declare readonly line: number;

  constructor(line: number, problem: string) {
    super(`Line ${line}: ${problem}`, 'transcript_parse_error', line);
  }
}

/* ---------------------------------------------------------------- shared helpers */

const EXAMPLE_WEBVTT_TIMING = '"00:00:01.000 --> 00:00:04.000"';
const EXAMPLE_SRT_TIMING = '"00:00:01,000 --> 00:00:04,000"';
const EXAMPLE_TIMESTAMPED_LINE = '"[0:15] text" or "1:02:03 text"';

/** Quotes a line for an error message, shortened so the message stays readable. */
function quote(line: string): string {
  return JSON.stringify(line.length > 60 ? `${line.slice(0, 57)}...` : line);
}

/** WebVTT parser algorithm: CRLF, CR and LF all end a line (and so in practice for SubRip). */
function splitLines(text: string): string[] {
  const withoutBom = text.startsWith('\uFEFF') ? text.slice(1) : text;
  return withoutBom.replace(/\r\n?/gu, '\n').split('\n');
}

function isBlank(line: string): boolean {
  return line.trim() === '';
}

class CueCollector {
  readonly cues: TranscriptCue[] = [];

  constructor(private readonly maxCues: number) {}

  add(cue: TranscriptCue, line: number): void {
    if (this.cues.length >= this.maxCues) {
      throw new TranscriptParseError(line, `the transcript has more than ${this.maxCues} cues, the most accepted`);
    }
    this.cues.push(cue);
  }
}

function requireEndAfterStart(startMs: number, endMs: number, line: number, style: TimestampStyle): void {
  if (endMs <= startMs) {
    throw new TranscriptParseError(
      line,
      `the cue ends (${formatTimestamp(endMs, style)}) before or when it starts (${formatTimestamp(startMs, style)})`,
    );
  }
}

/* ---------------------------------------------------------------- WebVTT */

const WEBVTT_SIGNATURE = /^WEBVTT(?:[ \t].*)?$/u;

/** Blocks that carry no cue: comments, style sheets, regions (and the editor's draft's attributes). */
const NON_CUE_BLOCK = /^(?:NOTE|STYLE|REGION|ATTRIBUTES)(?:[ \t]|$)/u;

const ASCII_WHITESPACE = /[\t\n\f\r ]/u;

/**
 * WebVTT Parsing, "collect a WebVTT timestamp": optional hours (any number of digits), two-digit
 * minutes and seconds (0–59), a full stop and exactly three digits of milliseconds.
 * A first field that is not exactly two digits, or exceeds 59, is read as hours.
 */
function readWebVttTimestamp(line: string, from: number): { ms: number; next: number } | null {
  let at = from;
  const digits = (): string => {
    const start = at;
    while (at < line.length && line[at] >= '0' && line[at] <= '9') at += 1;
    return line.slice(start, at);
  };
  const first = digits();
  if (first === '') return null;
  const hoursFirst = first.length !== 2 || Number(first) > 59;
  if (line[at] !== ':') return null;
  at += 1;
  const second = digits();
  if (second.length !== 2) return null;
  let [hours, minutes, seconds] = [0, Number(first), Number(second)];
  if (hoursFirst || line[at] === ':') {
    if (line[at] !== ':') return null;
    at += 1;
    const third = digits();
    if (third.length !== 2) return null;
    [hours, minutes, seconds] = [Number(first), Number(second), Number(third)];
  }
  if (line[at] !== '.') return null;
  at += 1;
  const millis = digits();
  if (millis.length !== 3 || minutes > 59 || seconds > 59) return null;
  return { ms: ((hours * 60 + minutes) * 60 + seconds) * 1000 + Number(millis), next: at };
}

/**
 * WebVTT Parsing, "collect WebVTT cue timings and settings": start, "-->", end, then settings,
 * which we accept and ignore (positioning has no meaning for a transcript).
 */
function readWebVttTimings(line: string): { startMs: number; endMs: number } | null {
  let at = 0;
  const skipWhitespace = (): void => {
    while (at < line.length && ASCII_WHITESPACE.test(line[at])) at += 1;
  };
  skipWhitespace();
  const start = readWebVttTimestamp(line, at);
  if (!start) return null;
  at = start.next;
  skipWhitespace();
  if (!line.startsWith('-->', at)) return null;
  at += 3;
  skipWhitespace();
  const end = readWebVttTimestamp(line, at);
  if (!end) return null;
  return { startMs: start.ms, endMs: end.ms };
}

const CHARACTER_REFERENCES: Readonly<Record<string, string>> = {
  amp: '&',
  lt: '<',
  gt: '>',
  quot: '"',
  apos: "'",
  nbsp: '\u00a0',
  lrm: '\u200e',
  rlm: '\u200f',
};

function decodeCodePoint(digits: string, radix: number): string {
  const codePoint = Number.parseInt(digits, radix);
  const valid = codePoint > 0 && codePoint <= 0x10ffff && !(codePoint >= 0xd800 && codePoint <= 0xdfff);
  return valid ? String.fromCodePoint(codePoint) : '\ufffd';
}

/**
 * The plain text of a cue payload (WebVTT cue text parsing rules, reduced to text): tags such as
 * `<v Roger>`, `<i>`, `<c.loud>` and `<00:00:05.000>` are dropped, character references decoded.
 * Unknown named references stay as written.
 */
function webVttPlainText(payload: string): string {
  return payload
    .replace(/<[^>]*(?:>|$)/gu, '')
    .replace(
      /&(?:#([0-9]+)|#[xX]([0-9a-fA-F]+)|([A-Za-z][A-Za-z0-9]*));/gu,
      (whole: string, decimal: string | undefined, hex: string | undefined, name: string | undefined) => {
        if (decimal !== undefined) return decodeCodePoint(decimal, 10);
        if (hex !== undefined) return decodeCodePoint(hex, 16);
        return name !== undefined && Object.hasOwn(CHARACTER_REFERENCES, name) ? CHARACTER_REFERENCES[name] : whole;
      },
    );
}

/** Escapes text so that `webVttPlainText` gives it back and it can never form "-->" or a tag. */
function escapeWebVttText(text: string): string {
  return text.replace(/&/gu, '&amp;').replace(/</gu, '&lt;').replace(/>/gu, '&gt;');
}

function parseWebVtt(lines: string[], collector: CueCollector): void {
  const signature = lines[0].replaceAll('\u0000', '\ufffd');
  if (!WEBVTT_SIGNATURE.test(signature)) {
    throw new TranscriptParseError(
      1,
      `expected the WebVTT signature "WEBVTT" (optionally followed by a space or tab and a title), found ${quote(lines[0])}`,
    );
  }
  // The header block after the signature line is ignored; a line with "-->" ends it early (parser algorithm).
  let index = 1;
  while (index < lines.length && lines[index] !== '' && !lines[index].includes('-->')) index += 1;

  while (index < lines.length) {
    // Lenient: whitespace-only lines between blocks are skipped like empty ones.
    if (isBlank(lines[index])) {
      index += 1;
      continue;
    }
    const blockStart = index;
    const block: string[] = [];
    let timingAt = -1;
    // "Collect a WebVTT block": "-->" on the first line, or on the second after an identifier,
    // is the timing line; "-->" anywhere later starts the next block.
    while (index < lines.length && lines[index] !== '') {
      const line = lines[index].replaceAll('\u0000', '\ufffd');
      if (line.includes('-->')) {
        const isTiming = block.length === 0 || (block.length === 1 && timingAt === -1);
        if (!isTiming) break;
        timingAt = block.length;
      }
      block.push(line);
      index += 1;
    }

    if (timingAt === -1) {
      if (NON_CUE_BLOCK.test(block[0])) continue;
      // Point at the line most likely meant as the timing: the first if it starts like a time, else the second.
      const badOffset = block.length > 1 && !/^\s*[0-9]+:/u.test(block[0]) ? 1 : 0;
      throw new TranscriptParseError(
        blockStart + badOffset + 1,
        `expected a cue timing like ${EXAMPLE_WEBVTT_TIMING}, found ${quote(block[badOffset])}`,
      );
    }
    const timingLine = blockStart + timingAt + 1;
    const timings = readWebVttTimings(block[timingAt]);
    if (!timings) {
      throw new TranscriptParseError(
        timingLine,
        `expected a cue timing like ${EXAMPLE_WEBVTT_TIMING}, found ${quote(block[timingAt])}`,
      );
    }
    requireEndAfterStart(timings.startMs, timings.endMs, timingLine, 'webvtt');
    const cue: TranscriptCue = {
      startMs: timings.startMs,
      endMs: timings.endMs,
      text: webVttPlainText(block.slice(timingAt + 1).join('\n')),
    };
    if (timingAt === 1) cue.identifier = block[0];
    collector.add(cue, timingLine);
  }
}

/* ---------------------------------------------------------------- SubRip */

const SRT_COUNTER = /^\s*[0-9]+\s*$/u;
/** "00:00:01,000 --> 00:00:04,000", leniently with "." for ","; anything after the end time is ignored. */
const SRT_TIMING =
  /^\s*([0-9]+):([0-9]{2}):([0-9]{2})[,.]([0-9]{3})\s*-->\s*([0-9]+):([0-9]{2}):([0-9]{2})[,.]([0-9]{3})(?:\s.*)?$/u;

function readSrtTimings(line: string): { startMs: number; endMs: number } | null {
  const match = SRT_TIMING.exec(line);
  if (!match) return null;
  const fields = match.slice(1).map(Number);
  if ([fields[1], fields[2], fields[5], fields[6]].some((value) => value > 59)) return null;
  const toMs = (h: number, m: number, s: number, ms: number): number => ((h * 60 + m) * 60 + s) * 1000 + ms;
  return { startMs: toMs(fields[0], fields[1], fields[2], fields[3]), endMs: toMs(fields[4], fields[5], fields[6], fields[7]) };
}

function parseSrt(lines: string[], collector: CueCollector): void {
  let index = 0;
  while (index < lines.length) {
    if (isBlank(lines[index])) {
      index += 1;
      continue;
    }
    // Lenient: a missing counter is tolerated when the block starts with its timing line.
    if (SRT_COUNTER.test(lines[index])) {
      index += 1;
    } else if (!lines[index].includes('-->')) {
      throw new TranscriptParseError(index + 1, `expected a subtitle number such as "1", found ${quote(lines[index])}`);
    }
    const timingLine = index + 1;
    const timings = index < lines.length ? readSrtTimings(lines[index]) : null;
    if (!timings) {
      const found = index < lines.length ? quote(lines[index]) : 'the end of the file';
      throw new TranscriptParseError(timingLine, `expected a cue timing like ${EXAMPLE_SRT_TIMING}, found ${found}`);
    }
    requireEndAfterStart(timings.startMs, timings.endMs, timingLine, 'srt');
    index += 1;
    const text: string[] = [];
    while (index < lines.length && !isBlank(lines[index])) {
      // Lenient: a counter straight followed by a timing line starts the next cue even without a blank line.
      const nextCueStarts = SRT_COUNTER.test(lines[index]) && readSrtTimings(lines[index + 1] ?? '') !== null;
      if (nextCueStarts) break;
      text.push(lines[index]);
      index += 1;
    }
    collector.add({ startMs: timings.startMs, endMs: timings.endMs, text: text.join('\n') }, timingLine);
  }
}

/* ---------------------------------------------------------------- timestamped lines */

const CLOCK = String.raw`(?:([0-9]+):)?([0-9]+):([0-9]{2})(?:\.([0-9]{1,3}))?`;
/**
 * "[1:02] text", "(1:02) text", "1:02 text", "1:02:03 text", optionally "1:02 - text".
 * Without hours, minutes may exceed 59 ("75:10"); with hours, minutes are 00–59.
 */
const TIMESTAMPED_LINE = new RegExp(
  String.raw`^\s*(?:\[${CLOCK}\]|\(${CLOCK}\)|${CLOCK}(?=\s|$))\s*(?:[-\u2013\u2014]\s+)?(.*)$`,
  'u',
);

function readTimestampedLine(line: string, lineNumber: number): { startMs: number; text: string } | null {
  const match = TIMESTAMPED_LINE.exec(line);
  if (!match) return null;
  // Three alternative clocks share the pattern; take whichever one matched.
  const clock = [1, 5, 9].map((offset) => match.slice(offset, offset + 4)).find((fields) => fields[2] !== undefined);
  if (!clock) return null;
  const [hoursText, minutesText, secondsText, fractionText] = clock;
  const hours = hoursText === undefined ? 0 : Number(hoursText);
  const [minutes, seconds] = [Number(minutesText), Number(secondsText)];
  const hoursGiven = hoursText !== undefined;
  if (seconds > 59 || (hoursGiven && (minutes > 59 || minutesText.length !== 2))) {
    throw new TranscriptParseError(
      lineNumber,
      `expected minutes and seconds from 00 to 59 in the timestamp, found ${quote(line.trim())}`,
    );
  }
  const millis = fractionText === undefined ? 0 : Number(fractionText.padEnd(3, '0'));
  return { startMs: ((hours * 60 + minutes) * 60 + seconds) * 1000 + millis, text: match[13].trimEnd() };
}

/**
 * Decisions for timestamped lines:
 * - each cue ends where the next begins; the last ends at `durationMs`, else `DEFAULT_LAST_CUE_MS` later;
 * - a line without a timestamp continues the previous cue's text (on a new line); blank lines are skipped;
 * - a non-empty line before the first timestamp is an error;
 * - a line with the same timestamp as the one before joins that cue; an earlier timestamp is an error.
 */
function parseTimestamped(lines: string[], collector: CueCollector, durationMs: number | undefined): void {
  const open: { startMs: number; text: string[]; line: number }[] = [];
  lines.forEach((line, index) => {
    const lineNumber = index + 1;
    if (isBlank(line)) return;
    const stamped = readTimestampedLine(line, lineNumber);
    const previous = open[open.length - 1];
    if (!stamped) {
      if (!previous) {
        throw new TranscriptParseError(
          lineNumber,
          `expected a line starting with a timestamp like ${EXAMPLE_TIMESTAMPED_LINE}, found ${quote(line)}`,
        );
      }
      previous.text.push(line.trim());
      return;
    }
    if (durationMs !== undefined && stamped.startMs >= durationMs) {
      throw new TranscriptParseError(
        lineNumber,
        `the timestamp ${formatTimestamp(stamped.startMs, 'webvtt')} is at or after the end of the footage (${formatTimestamp(durationMs, 'webvtt')})`,
      );
    }
    if (previous && stamped.startMs < previous.startMs) {
      throw new TranscriptParseError(
        lineNumber,
        `timestamps must not go backwards: ${formatTimestamp(stamped.startMs, 'webvtt')} comes after ${formatTimestamp(previous.startMs, 'webvtt')}`,
      );
    }
    if (previous && stamped.startMs === previous.startMs) {
      if (stamped.text !== '') previous.text.push(stamped.text);
      return;
    }
    open.push({ startMs: stamped.startMs, text: stamped.text === '' ? [] : [stamped.text], line: lineNumber });
  });
  open.forEach((cue, index) => {
    const endMs = open[index + 1]?.startMs ?? durationMs ?? cue.startMs + DEFAULT_LAST_CUE_MS;
    collector.add({ startMs: cue.startMs, endMs, text: cue.text.join('\n') }, cue.line);
  });
}

/* ---------------------------------------------------------------- detection and entry point */

function detectFormat(lines: string[]): TranscriptFormat {
  if (/^WEBVTT(?:[ \t]|$)/u.test(lines[0])) return 'webvtt';
  const first = lines.findIndex((line) => !isBlank(line));
  if (first === -1) throw new TranscriptParseError(1, 'the transcript is empty');
  if (SRT_COUNTER.test(lines[first]) && (lines[first + 1] ?? '').includes('-->')) return 'srt';
  if (TIMESTAMPED_LINE.test(lines[first])) return 'timestamped';
  throw new TranscriptParseError(
    first + 1,
    `could not tell the transcript format: expected "WEBVTT" (WebVTT), a cue number then a timing line (SubRip) ` +
      `or a line starting with a timestamp like ${EXAMPLE_TIMESTAMPED_LINE}, found ${quote(lines[first])}`,
  );
}

function positiveWholeNumber(value: number | undefined, name: string): number | undefined {
  if (value !== undefined && (!Number.isSafeInteger(value) || value <= 0)) {
    throw new EngineError(`${name} must be a whole number greater than zero, got ${value}`, 'invalid_option');
  }
  return value;
}

/**
 * Parses a transcript. `format: 'auto'` picks WebVTT when the first line is the "WEBVTT"
 * signature, SubRip when the first non-empty block is a number then a timing line, timestamped
 * lines when the first non-empty line starts with a timestamp, and otherwise reports the line.
 * Cues are returned in file order.
 */
export function parseTranscript(
  text: string,
  format: TranscriptFormat | 'auto',
  options: ParseTranscriptOptions = {},
): ParsedTranscript {
  const durationMs = positiveWholeNumber(options.durationMs, 'durationMs');
  const maxCues = positiveWholeNumber(options.maxCues, 'maxCues') ?? DEFAULT_MAX_CUES;
  const lines = splitLines(text);
  const resolved = format === 'auto' ? detectFormat(lines) : format;
  const collector = new CueCollector(maxCues);
  switch (resolved) {
    case 'webvtt':
      parseWebVtt(lines, collector);
      break;
    case 'srt':
      parseSrt(lines, collector);
      break;
    case 'timestamped':
      parseTimestamped(lines, collector, durationMs);
      break;
  }
  return { format: resolved, cues: collector.cues };
}

/* ---------------------------------------------------------------- formatting */

export type TimestampStyle = 'webvtt' | 'srt';

/** "01:02:03.004" (WebVTT) or "01:02:03,004" (SubRip); hours always shown, two digits or more. */
export function formatTimestamp(ms: number, style: TimestampStyle): string {
  if (!Number.isSafeInteger(ms) || ms < 0) {
    throw new EngineError(`a timestamp must be a whole, non-negative number of milliseconds, got ${ms}`, 'invalid_timestamp');
  }
  const pad = (value: number, width = 2): string => String(value).padStart(width, '0');
  const hours = Math.floor(ms / 3_600_000);
  const minutes = Math.floor(ms / 60_000) % 60;
  const seconds = Math.floor(ms / 1000) % 60;
  return `${pad(hours)}:${pad(minutes)}:${pad(seconds)}${style === 'srt' ? ',' : '.'}${pad(ms % 1000, 3)}`;
}

function timingLine(cue: TranscriptCue, index: number, style: TimestampStyle): string {
  const start = formatTimestamp(cue.startMs, style);
  const end = formatTimestamp(cue.endMs, style);
  if (cue.endMs <= cue.startMs) {
    throw new EngineError(`cue ${index + 1} ends (${end}) before or when it starts (${start})`, 'invalid_cue');
  }
  return `${start} --> ${end}`;
}

/** Text lines that survive both formats: a blank line would end the cue, so blank lines are dropped. */
function textLines(text: string): string[] {
  return text.split(/\r\n?|\n/u).filter((line) => !isBlank(line));
}

/** A WebVTT file; text is escaped so that parsing it gives the same plain text back. */
export function formatWebVtt(cues: readonly TranscriptCue[]): string {
  const blocks = cues.map((cue, index) => {
    const lines: string[] = [];
    if (cue.identifier !== undefined && cue.identifier !== '') {
      if (/-->|[\r\n]/u.test(cue.identifier) || isBlank(cue.identifier)) {
        throw new EngineError(
          `cue ${index + 1} has an identifier WebVTT cannot hold (no "-->", line breaks or only spaces)`,
          'invalid_cue',
        );
      }
      lines.push(cue.identifier);
    }
    lines.push(timingLine(cue, index, 'webvtt'), ...textLines(cue.text).map(escapeWebVttText));
    return lines.join('\n');
  });
  return `${['WEBVTT', ...blocks].join('\n\n')}\n`;
}

/** A SubRip file, numbered from 1; text is written as is. */
export function formatSrt(cues: readonly TranscriptCue[]): string {
  const blocks = cues.map((cue, index) =>
    [String(index + 1), timingLine(cue, index, 'srt'), ...textLines(cue.text)].join('\n'),
  );
  return blocks.map((block) => `${block}\n\n`).join('');
}
