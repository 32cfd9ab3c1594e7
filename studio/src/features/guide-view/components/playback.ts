/**
 * Following the video: which step and which cue are playing, and which cues a search keeps.
 * Plain functions (no React) so the edge cases are tested on their own.
 */
import type { Cue } from '../api/types';

/** What the step highlighting needs of a step. */
export interface TimedStep {
  id: string;
  position: number;
  footageId: string | null;
  startMs: number | null;
  endMs: number | null;
}

/** A step's moment is in the guide's main video when it has a start and names no other footage. */
export function isInMainVideo(step: TimedStep, mainFootageId: string | null): boolean {
  return step.startMs !== null && mainFootageId !== null && (step.footageId === null || step.footageId === mainFootageId);
}

/**
 * The step playing at `ms`. A step with an end time (after its start) plays until then; one without plays until a
 * later step starts. Of the steps playing, the one that started last wins, so a short step inside a long one stands
 * out, and the long one is current again once the short one ends. Steps need not be in time order; on an equal
 * start the later position wins, as the reader gets there by reading on. Only steps anchored in the main video
 * count; none is current before the first of them starts.
 */
export function currentStepId(steps: readonly TimedStep[], ms: number, mainFootageId: string | null): string | null {
  const started = steps.filter(
    (step): step is TimedStep & { startMs: number } => isInMainVideo(step, mainFootageId) && step.startMs !== null && step.startMs <= ms,
  );
  if (started.length === 0) return null;
  const latestStart = Math.max(...started.map((step) => step.startMs));
  let current: (TimedStep & { startMs: number }) | null = null;
  for (const step of started) {
    const playing = step.endMs !== null && step.endMs > step.startMs ? ms < step.endMs : step.startMs === latestStart;
    if (!playing) continue;
    if (current === null || step.startMs > current.startMs || (step.startMs === current.startMs && step.position > current.position)) {
      current = step;
    }
  }
  return current?.id ?? null;
}

/** The index of the cue on screen at `ms` (cues are in time order; the last one started wins an overlap), or -1. */
export function currentCueIndex(cues: readonly Cue[], ms: number): number {
  let found = -1;
  for (let index = 0; index < cues.length; index += 1) {
    const cue = cues[index];
    if (cue.startMs > ms) break;
    if (cue.endMs > ms) found = index;
  }
  return found;
}

/** Lower case without accents, so "Tenths" finds "tenths" and "déjà" finds "deja". */
function fold(text: string): string {
  return text.normalize('NFD').replace(/\p{Diacritic}/gu, '').toLowerCase();
}

/** The words of a search, folded; punctuation around words does not count. */
export function searchWords(query: string): string[] {
  return fold(query)
    .split(/\s+/)
    .map((word) => word.replace(/^[^\p{L}\p{N}]+|[^\p{L}\p{N}]+$/gu, ''))
    .filter((word) => word !== '');
}

export interface CueMatch<C extends Cue = Cue> {
  /** The cue's index in the full transcript (for highlighting the playing cue among results). */
  index: number;
  cue: C;
}

/** The cues holding every word of the search (anywhere in a word: "thou" finds "thousandths"); all cues for an empty search. */
export function filterCues<C extends Cue>(cues: readonly C[], query: string): CueMatch<C>[] {
  const words = searchWords(query);
  const matches: CueMatch<C>[] = [];
  cues.forEach((cue, index) => {
    const text = fold(cue.text);
    if (words.every((word) => text.includes(word))) matches.push({ index, cue });
  });
  return matches;
}
