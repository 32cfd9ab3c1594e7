import { suggestMarks, type CueText } from './mark-suggestions';

// A transcript written for these tests (invented shop talk, not from any video).
const cues: CueText[] = [
  { startMs: 0, endMs: 4000, text: 'Morning. The two of us are pulling the gearbox today.' },
  { startMs: 4000, endMs: 9000, text: "This is the nineteen eighty-seven pickup, it's been on the lift 24/7 this week." },
  { startMs: 9000, endMs: 15000, text: 'Four bolts hold the bell housing, and we have two couplers to try.' },
  { startMs: 15000, endMs: 21000, text: 'The HL-2107 coupler slides on; the pilot nose mics at point five nine zero two inches.' },
  { startMs: 21000, endMs: 27000, text: "Bearing bore is fifteen point zero zero eight millimetres, so that's about half a thou of room." },
  { startMs: 27000, endMs: 33000, text: 'The catalogue one, B D twenty-seven forty-one, has twenty-seven teeth, so it is out.' },
];

describe('suggestMarks', () => {
  const suggestions = suggestMarks(cues, ['HL-2107', 'BD-2741', 'KB-6202-P']);

  it('finds the spoken measurements at their cue times', () => {
    const measurements = suggestions.filter((suggestion) => suggestion.kind === 'measurement');
    expect(measurements.map(({ startMs, phrase, unit }) => ({ startMs, phrase, unit }))).toEqual([
      { startMs: 15000, phrase: 'point five nine zero two inches', unit: 'in' },
      { startMs: 21000, phrase: 'fifteen point zero zero eight millimetres', unit: 'mm' },
      { startMs: 21000, phrase: 'half a thou', unit: 'in' },
    ]);
    expect(measurements.map((suggestion) => suggestion.kind === 'measurement' && suggestion.value)).toEqual([0.5902, 15.008, 0.0005]);
  });

  it('finds written and spoken part numbers', () => {
    const parts = suggestions.filter((suggestion) => suggestion.kind === 'part');
    expect(parts.map(({ startMs, kind, phrase }) => ({ startMs, kind, phrase }))).toEqual([
      { startMs: 15000, kind: 'part', phrase: 'HL-2107' },
      { startMs: 27000, kind: 'part', phrase: 'B D twenty-seven forty-one' },
    ]);
  });

  it('suggests nothing for sentences that only look like numbers', () => {
    // "the two of us", a year, "24/7", part counts and a tooth count are not measurements.
    expect(suggestions.filter((suggestion) => suggestion.cueIndex <= 2)).toEqual([]);
    expect(suggestions.filter((suggestion) => suggestion.cueIndex === 5 && suggestion.kind === 'measurement')).toEqual([]);
  });

  it('gives a suggestion the same key when the same words are found again, even re-timed', () => {
    const again = suggestMarks(cues.map((cue) => ({ ...cue, startMs: cue.startMs + 1700 })), ['HL-2107', 'BD-2741']);
    expect(again.map((suggestion) => suggestion.suggestionKey)).toEqual(
      suggestions.map((suggestion) => suggestion.suggestionKey),
    );
  });
});
