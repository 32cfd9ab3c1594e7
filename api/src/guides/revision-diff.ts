import { diffWords } from 'diff';
import type { FitCheckState } from '../engine/checklist';

/**
 * Comparing two published revisions of a guide: which steps were added, removed, moved or changed, with a
 * word-level diff of the changed text, and how the verified-fit checklist stood when each was published.
 * Pure (no framework, no I/O) so it is tested on its own; the service feeds it snapshots and check history.
 */

/** What the comparison reads of a step in a snapshot (`GuideStepContent` fits). */
export interface DiffStepInput {
  id: string;
  title: string;
  body: string;
  caution: { level: string; text: string } | null;
  startMs: number | null;
  estimatedMinutes?: number;
}

/** What it reads of the guide around the steps (`GuideContent` fits). */
export interface DiffGuideInput {
  title: string;
  summary: string;
  tools: string[];
  consumables: string[];
  steps: DiffStepInput[];
}

export type PieceChange = 'same' | 'added' | 'removed';

/** A run of words that both texts share, or that only the newer (added) or the older (removed) has. */
export interface TextPiece {
  change: PieceChange;
  text: string;
}

export type StepField = 'title' | 'body' | 'caution' | 'moment' | 'time';
export type GuideField = 'title' | 'summary' | 'tools' | 'consumables';

export interface FieldChange<F extends string> {
  field: F;
  before: string;
  after: string;
  /** The words of `before` and `after` in reading order, each marked same, added or removed. */
  pieces: TextPiece[];
}

/** A step as placed in one revision; `number` counts from 1 in reading order. */
export interface PlacedStep {
  id: string;
  title: string;
  number: number;
}

export interface MovedStep {
  id: string;
  title: string;
  fromNumber: number;
  toNumber: number;
}

export interface ChangedStep {
  id: string;
  title: string;
  fromNumber: number;
  toNumber: number;
  changes: FieldChange<StepField>[];
}

export interface RevisionDiff {
  guide: FieldChange<GuideField>[];
  added: PlacedStep[];
  removed: PlacedStep[];
  moved: MovedStep[];
  changed: ChangedStep[];
  /** Steps in both revisions, in the same relative order, with the same words. */
  unchangedCount: number;
}

/**
 * Past this many inserted plus deleted words a text is shown as wholly replaced: the word diff's work grows
 * with the size of the difference, so a rewritten essay cannot make one request slow.
 */
export const MAX_WORD_EDITS = 400;

export function compareRevisions(from: DiffGuideInput, to: DiffGuideInput): RevisionDiff {
  const before = new Map(from.steps.map((step, index) => [step.id, { step, number: index + 1 }]));
  const after = new Map(to.steps.map((step, index) => [step.id, { step, number: index + 1 }]));

  const added = to.steps.flatMap((step, index) => (before.has(step.id) ? [] : [{ id: step.id, title: step.title, number: index + 1 }]));
  const removed = from.steps.flatMap((step, index) => (after.has(step.id) ? [] : [{ id: step.id, title: step.title, number: index + 1 }]));

  // Kept steps in their new order, by old position: the longest run already in order stayed put, the rest moved.
  const kept = to.steps.filter((step) => before.has(step.id));
  const stayed = longestIncreasingRun(kept.map((step) => before.get(step.id)!.number));
  const moved: MovedStep[] = [];
  const changed: ChangedStep[] = [];
  let unchangedCount = 0;
  kept.forEach((step, index) => {
    const old = before.get(step.id)!;
    const toNumber = after.get(step.id)!.number;
    const wasMoved = !stayed.has(index);
    if (wasMoved) moved.push({ id: step.id, title: step.title, fromNumber: old.number, toNumber });
    const changes = stepChanges(old.step, step);
    if (changes.length > 0) changed.push({ id: step.id, title: step.title, fromNumber: old.number, toNumber, changes });
    if (!wasMoved && changes.length === 0) unchangedCount += 1;
  });

  return { guide: guideChanges(from, to), added, removed, moved, changed, unchangedCount };
}

function guideChanges(from: DiffGuideInput, to: DiffGuideInput): FieldChange<GuideField>[] {
  return [
    textChange('title' as const, from.title, to.title),
    textChange('summary' as const, plainText(from.summary), plainText(to.summary)),
    listChange('tools' as const, from.tools, to.tools),
    listChange('consumables' as const, from.consumables, to.consumables),
  ].filter((change): change is FieldChange<GuideField> => change !== null);
}

function stepChanges(from: DiffStepInput, to: DiffStepInput): FieldChange<StepField>[] {
  return [
    textChange('title' as const, from.title, to.title),
    textChange('body' as const, plainText(from.body), plainText(to.body)),
    textChange('caution' as const, cautionText(from.caution), cautionText(to.caution)),
    textChange('moment' as const, momentText(from.startMs), momentText(to.startMs)),
    textChange('time' as const, minutesText(from.estimatedMinutes), minutesText(to.estimatedMinutes)),
  ].filter((change): change is FieldChange<StepField> => change !== null);
}

function textChange<F extends string>(field: F, before: string, after: string): FieldChange<F> | null {
  return before === after ? null : { field, before, after, pieces: wordPieces(before, after) };
}

/** Lists (tools, consumables) compare item by item: one item a line. */
function listChange<F extends string>(field: F, before: string[], after: string[]): FieldChange<F> | null {
  if (before.length === after.length && before.every((item, index) => item === after[index])) return null;
  const had = new Set(before);
  const has = new Set(after);
  const pieces: TextPiece[] = [
    ...before.map((item) => ({ change: (has.has(item) ? 'same' : 'removed') as PieceChange, text: item })),
    ...after.filter((item) => !had.has(item)).map((item) => ({ change: 'added' as const, text: item })),
  ];
  return { field, before: before.join('\n'), after: after.join('\n'), pieces };
}

/** Word-level differences (jsdiff's `diffWords`), merged into runs; past `MAX_WORD_EDITS` the whole text is replaced. */
export function wordPieces(before: string, after: string): TextPiece[] {
  const changes = before && after ? diffWords(before, after, { maxEditLength: MAX_WORD_EDITS }) : undefined;
  const pieces: TextPiece[] = [];
  const push = (change: PieceChange, text: string) => {
    if (!text) return;
    const last = pieces[pieces.length - 1];
    if (last && last.change === change) last.text += text;
    else pieces.push({ change, text });
  };
  if (!changes) {
    push('removed', before);
    push('added', after);
    return pieces;
  }
  for (const change of changes) push(change.added ? 'added' : change.removed ? 'removed' : 'same', change.value);
  return pieces;
}

/** The words of sanitized rich text, for comparing what a reader reads rather than the markup. */
export function plainText(html: string): string {
  return html
    .replace(/<\/(p|li|h[1-6])>|<br\s*\/?>/gi, '\n')
    .replace(/<[^>]*>/g, '')
    .replace(/&nbsp;/g, ' ')
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&')
    .replace(/[ \t]+/g, ' ')
    .replace(/\s*\n\s*/g, '\n')
    .trim();
}

function cautionText(caution: DiffStepInput['caution']): string {
  return caution ? `${caution.level}: ${caution.text}` : '';
}

function momentText(startMs: number | null): string {
  if (startMs === null) return '';
  const seconds = Math.floor(startMs / 1000);
  return `${Math.floor(seconds / 60)}:${String(seconds % 60).padStart(2, '0')}`;
}

function minutesText(minutes: number | undefined): string {
  return minutes === undefined ? '' : `${minutes} min`;
}

/**
 * Indexes (into `values`) of one longest strictly increasing subsequence, in O(n log n) (patience sorting),
 * so comparing guides of hundreds of steps stays fast.
 */
export function longestIncreasingRun(values: number[]): Set<number> {
  const tails: number[] = []; // index into values of the smallest tail of each run length
  const previous: number[] = new Array<number>(values.length).fill(-1);
  values.forEach((value, index) => {
    let low = 0;
    let high = tails.length;
    while (low < high) {
      const middle = (low + high) >> 1;
      if (values[tails[middle]] < value) low = middle + 1;
      else high = middle;
    }
    if (low > 0) previous[index] = tails[low - 1];
    tails[low] = index;
  });
  const run = new Set<number>();
  for (let index = tails.length ? tails[tails.length - 1] : -1; index !== -1; index = previous[index]) run.add(index);
  return run;
}

/** A check of the guide's assembly with its history, oldest event first. Times are epoch milliseconds. */
export interface CheckHistoryInput {
  id: string;
  title: string;
  required: boolean;
  createdAtMs: number;
  state: FitCheckState;
  events: { fromState: FitCheckState | null; toState: FitCheckState; atMs: number }[];
}

/** A check's state at a moment: after its last change by then; before its first change, what that change left; null before it existed. */
export function checkStateAt(check: CheckHistoryInput, atMs: number): FitCheckState | null {
  if (check.createdAtMs > atMs) return null;
  let state: FitCheckState | null = null;
  for (const event of check.events) {
    if (event.atMs <= atMs) state = event.toState;
    else {
      if (state === null) state = event.fromState ?? 'open';
      break;
    }
  }
  return state ?? check.state;
}

export interface ChecklistStateChange {
  id: string;
  title: string;
  required: boolean;
  /** The state when the older revision was published; null when the check did not exist yet (or not on that assembly). */
  before: FitCheckState | null;
  after: FitCheckState | null;
  changed: boolean;
}

/** Each check's state when the two revisions were published; checks absent or retired at both moments are left out. */
export function compareChecklists(
  fromChecks: CheckHistoryInput[],
  fromAtMs: number,
  toChecks: CheckHistoryInput[],
  toAtMs: number,
): ChecklistStateChange[] {
  const rows = new Map<string, ChecklistStateChange>();
  const row = (check: CheckHistoryInput) =>
    rows.get(check.id) ?? rows.set(check.id, { id: check.id, title: check.title, required: check.required, before: null, after: null, changed: false }).get(check.id)!;
  for (const check of fromChecks) {
    const state = checkStateAt(check, fromAtMs);
    if (state !== null) row(check).before = state;
  }
  for (const check of toChecks) {
    const state = checkStateAt(check, toAtMs);
    if (state !== null) row(check).after = state;
  }
  const visible = (state: FitCheckState | null) => state !== null && state !== 'retired';
  return [...rows.values()]
    .filter((item) => visible(item.before) || visible(item.after))
    .map((item) => ({ ...item, changed: item.before !== item.after }));
}
