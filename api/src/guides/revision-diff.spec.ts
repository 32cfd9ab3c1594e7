import { growthRatio, GROWTH_ALLOWANCE, GROWTH_FACTOR } from '../testing/linear-time';
import {
  checkStateAt,
  compareChecklists,
  compareRevisions,
  longestIncreasingRun,
  plainText,
  wordPieces,
  type CheckHistoryInput,
  type DiffGuideInput,
  type DiffStepInput,
} from './revision-diff';

// Expected answers are worked by hand from the inputs beside each check (common practice for diff tools:
// a step keeps its identity by id, so a renamed step is "changed", never "removed and added").

const step = (id: string, title = `Step ${id}`, body = `<p>Body of ${id}.</p>`, extra: Partial<DiffStepInput> = {}): DiffStepInput => ({
  id,
  title,
  body,
  caution: null,
  startMs: null,
  ...extra,
});

const guide = (steps: DiffStepInput[], extra: Partial<DiffGuideInput> = {}): DiffGuideInput => ({
  title: 'Coupler fit',
  summary: '<p>How the coupler fits.</p>',
  tools: ['Feeler gauges'],
  consumables: [],
  steps,
  ...extra,
});

describe('compareRevisions', () => {
  it('finds nothing between a revision and itself', () => {
    const same = guide([step('a'), step('b'), step('c')]);
    expect(compareRevisions(same, same)).toEqual({ guide: [], added: [], removed: [], moved: [], changed: [], unchangedCount: 3 });
  });

  it('names added and removed steps with their numbers in their own revision', () => {
    // a b c  →  a c d : b (2nd) removed, d (3rd) added.
    const diff = compareRevisions(guide([step('a'), step('b'), step('c')]), guide([step('a'), step('c'), step('d')]));
    expect(diff.removed).toEqual([{ id: 'b', title: 'Step b', number: 2 }]);
    expect(diff.added).toEqual([{ id: 'd', title: 'Step d', number: 3 }]);
    // c went from 3rd to 2nd only because b left: that is no move.
    expect(diff.moved).toEqual([]);
    expect(diff.unchangedCount).toBe(2);
  });

  it('reports the fewest moves: one step taken to the end is one move, not three', () => {
    // a b c d  →  b c d a : the run b c d stays in order, a moved from 1st to 4th.
    const diff = compareRevisions(guide(['a', 'b', 'c', 'd'].map((id) => step(id))), guide(['b', 'c', 'd', 'a'].map((id) => step(id))));
    expect(diff.moved).toEqual([{ id: 'a', title: 'Step a', fromNumber: 1, toNumber: 4 }]);
    expect(diff.unchangedCount).toBe(3);
  });

  it('tells two swapped steps as one move', () => {
    const diff = compareRevisions(guide([step('a'), step('b')]), guide([step('b'), step('a')]));
    expect(diff.moved).toHaveLength(1);
    expect(diff.unchangedCount).toBe(1);
  });

  it('keeps a step by its id through a new title, body, caution, moment and time, with word pieces', () => {
    const before = step('a', 'Measure the bore', '<p>Measure the bore at two depths.</p>', { startMs: 61_000 });
    const after = step('a', 'Measure the coupler bore', '<p>Measure the bore at three depths.</p>', {
      startMs: 75_000,
      caution: { level: 'CAUTION', text: 'Deburr first.' },
      estimatedMinutes: 10,
    });
    const diff = compareRevisions(guide([before]), guide([after]));
    expect(diff.added).toEqual([]);
    expect(diff.removed).toEqual([]);
    const [changed] = diff.changed;
    expect(changed.fromNumber).toBe(1);
    expect(changed.changes.map((change) => change.field)).toEqual(['title', 'body', 'caution', 'moment', 'time']);
    expect(changed.changes[0].pieces).toEqual([
      { change: 'same', text: 'Measure the ' },
      { change: 'added', text: 'coupler ' },
      { change: 'same', text: 'bore' },
    ]);
    expect(changed.changes[1].pieces).toEqual([
      { change: 'same', text: 'Measure the bore at ' },
      { change: 'removed', text: 'two' },
      { change: 'added', text: 'three' },
      { change: 'same', text: ' depths.' },
    ]);
    expect(changed.changes[2]).toMatchObject({ before: '', after: 'CAUTION: Deburr first.' });
    expect(changed.changes[3]).toMatchObject({ before: '1:01', after: '1:15' });
    expect(changed.changes[4]).toMatchObject({ before: '', after: '10 min' });
  });

  it('compares the words a reader reads, not the markup', () => {
    const diff = compareRevisions(guide([step('a', 'A', '<p>Grease the spline.</p>')]), guide([step('a', 'A', '<p><strong>Grease</strong> the spline.</p>')]));
    expect(diff.changed).toEqual([]);
    expect(plainText('<p>One &amp; two</p><p>three</p>')).toBe('One & two\nthree');
  });

  it('a moved and changed step is listed under both', () => {
    const diff = compareRevisions(guide([step('a'), step('b'), step('c')]), guide([step('c', 'New title'), step('a'), step('b')]));
    expect(diff.moved).toEqual([{ id: 'c', title: 'New title', fromNumber: 3, toNumber: 1 }]);
    expect(diff.changed.map((item) => item.id)).toEqual(['c']);
    expect(diff.unchangedCount).toBe(2);
  });

  it('lists the guide’s own changes: title, summary, tools added and removed', () => {
    const diff = compareRevisions(guide([]), guide([], { title: 'Coupler fit, revised', tools: ['Torque wrench'] }));
    expect(diff.guide.map((change) => change.field)).toEqual(['title', 'tools']);
    expect(diff.guide[1].pieces).toEqual([
      { change: 'removed', text: 'Feeler gauges' },
      { change: 'added', text: 'Torque wrench' },
    ]);
  });

  it('treats a text rewritten past the edit limit as replaced whole', () => {
    const words = (prefix: string) => Array.from({ length: 1_000 }, (_, index) => `${prefix}${index}`).join(' ');
    expect(wordPieces(words('x'), words('y'))).toEqual([
      { change: 'removed', text: words('x') },
      { change: 'added', text: words('y') },
    ]);
  });

  it('grows linearly with the number of steps (200 steps, then 8×)', () => {
    const revisionPair = (count: number): [DiffGuideInput, DiffGuideInput] => {
      const steps = Array.from({ length: count }, (_, index) =>
        step(`s${index}`, `Step ${index}`, `<p>Check the coupler at station ${index}; record the reading and the instrument.</p>`),
      );
      // Every tenth step reworded, every fiftieth moved to the end, one removed and one added.
      const changed = steps.map((item, index) => (index % 10 === 0 ? { ...item, body: item.body.replace('record', 'write down') } : item));
      const moved = [...changed.filter((_, index) => index % 50 !== 7), ...changed.filter((_, index) => index % 50 === 7)];
      return [guide(steps), guide([...moved.slice(1), step('new')])];
    };
    const small = revisionPair(200);
    const large = revisionPair(200 * GROWTH_FACTOR);
    const diff = compareRevisions(...small);
    expect(diff.moved).toHaveLength(4);
    expect(diff.changed).toHaveLength(19); // step 0 was removed
    // Warm the compiler on the large input first: otherwise its first rounds time the JIT, not the work.
    for (let round = 0; round < 20; round += 1) compareRevisions(...large);
    expect(growthRatio((pair) => compareRevisions(...pair), small, large)).toBeLessThanOrEqual(GROWTH_ALLOWANCE);
  });
});

describe('longestIncreasingRun', () => {
  it('keeps one longest increasing run', () => {
    // 3 1 2 4 → 1 2 4 at indexes 1, 2, 3.
    expect([...longestIncreasingRun([3, 1, 2, 4])].sort()).toEqual([1, 2, 3]);
    expect(longestIncreasingRun([]).size).toBe(0);
  });
});

describe('checklist states at each revision', () => {
  const check = (extra: Partial<CheckHistoryInput> = {}): CheckHistoryInput => ({
    id: 'c1',
    title: 'Spline engagement',
    required: true,
    createdAtMs: 1_000,
    state: 'confirmed',
    events: [
      { fromState: 'open', toState: 'bench_pass', atMs: 2_000 },
      { fromState: 'bench_pass', toState: 'confirmed', atMs: 3_000 },
    ],
    ...extra,
  });

  it('reads the state at a moment from the history', () => {
    expect(checkStateAt(check(), 500)).toBeNull(); // not yet made
    expect(checkStateAt(check(), 1_500)).toBe('open'); // before its first change: what that change started from
    expect(checkStateAt(check(), 2_000)).toBe('bench_pass');
    expect(checkStateAt(check(), 9_000)).toBe('confirmed');
    expect(checkStateAt(check({ events: [] }), 9_000)).toBe('confirmed'); // never changed: as it is now
  });

  it('says before and after, and leaves out checks retired at both moments', () => {
    const retired = check({ id: 'c2', title: 'Old check', state: 'retired', events: [{ fromState: 'open', toState: 'retired', atMs: 1_100 }] });
    const late = check({ id: 'c3', title: 'New check', createdAtMs: 4_000, state: 'open', events: [] });
    const rows = compareChecklists([check(), retired, late], 1_500, [check(), retired, late], 5_000);
    expect(rows).toEqual([
      { id: 'c1', title: 'Spline engagement', required: true, before: 'open', after: 'confirmed', changed: true },
      { id: 'c3', title: 'New check', required: true, before: null, after: 'open', changed: true },
    ]);
  });
});
