import { extractMeasurements, findPartNumbers, type SpokenLengthUnit } from './spoken-measurements';

/**
 * Suggested marks mined from a transcript: every spoken measurement and every mention of one of
 * the workshop's part numbers becomes a suggestion at its cue's start time. A person accepts or
 * dismisses each; `suggestionKey` lets a re-run recognise what was already dismissed.
 */

export interface CueText {
  startMs: number;
  endMs: number;
  text: string;
}

export type MarkSuggestion =
  | {
      kind: 'measurement';
      startMs: number;
      endMs: number;
      cueIndex: number;
      phrase: string;
      value: number;
      unit: SpokenLengthUnit;
      millimetres: number;
      suggestionKey: string;
    }
  | {
      kind: 'part';
      startMs: number;
      endMs: number;
      cueIndex: number;
      phrase: string;
      partNumber: string;
      suggestionKey: string;
    };

const normalise = (text: string) => text.toLowerCase().replace(/\s+/g, ' ').trim();

/**
 * A stable identity for a suggestion: what was found and the sentence it was found in. It survives
 * re-running the miner and replacing the transcript with re-timed cues of the same words.
 */
function keyOf(kind: string, what: string, cueText: string): string {
  return `${kind}:${normalise(what)}:${normalise(cueText)}`;
}

export function suggestMarks(cues: readonly CueText[], partNumbers: readonly string[]): MarkSuggestion[] {
  const suggestions: MarkSuggestion[] = [];
  cues.forEach((cue, cueIndex) => {
    for (const hit of extractMeasurements(cue.text)) {
      suggestions.push({
        kind: 'measurement',
        startMs: cue.startMs,
        endMs: cue.endMs,
        cueIndex,
        phrase: hit.phrase,
        value: hit.value,
        unit: hit.unit,
        millimetres: hit.millimetres,
        suggestionKey: keyOf('measurement', `${hit.value} ${hit.unit}`, cue.text),
      });
    }
    for (const mention of findPartNumbers(cue.text, partNumbers)) {
      suggestions.push({
        kind: 'part',
        startMs: cue.startMs,
        endMs: cue.endMs,
        cueIndex,
        phrase: mention.phrase,
        partNumber: mention.partNumber,
        suggestionKey: keyOf('part', mention.partNumber, cue.text),
      });
    }
  });
  return suggestions;
}
