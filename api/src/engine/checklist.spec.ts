import { canTransition, rollUpChecklist, stateAfterOutcome, type CheckSnapshot } from './checklist';

// These rules are Fitwright's own (DESIGN.md, "Checklist roll-up"); no outside standard applies.
const check = (state: CheckSnapshot['state'], evidenceCount = 0, required = true): CheckSnapshot => ({
  state,
  required,
  evidenceCount,
});

describe('rollUpChecklist', () => {
  it('is open with no counted checks', () => {
    expect(rollUpChecklist([])).toBe('open');
    expect(rollUpChecklist([check('confirmed', 1, false)])).toBe('open');
  });

  it('is confirmed only when every required check is confirmed with evidence', () => {
    expect(rollUpChecklist([check('confirmed', 1), check('confirmed', 2)])).toBe('confirmed');
    expect(rollUpChecklist([check('confirmed', 1), check('confirmed', 0)])).toBe('bench_pass');
    expect(rollUpChecklist([check('confirmed', 1), check('bench_pass')])).toBe('bench_pass');
  });

  it('ignores retired and optional checks', () => {
    expect(rollUpChecklist([check('confirmed', 1), check('retired'), check('open', 0, false)])).toBe('confirmed');
  });

  it('is no-fit as soon as one required check is', () => {
    expect(rollUpChecklist([check('confirmed', 1), check('no_fit')])).toBe('no_fit');
    expect(rollUpChecklist([check('confirmed', 1), check('no_fit', 0, false)])).toBe('confirmed');
  });

  it('stays open while anything required is open', () => {
    expect(rollUpChecklist([check('bench_pass'), check('open')])).toBe('open');
  });
});

describe('stateAfterOutcome', () => {
  it('moves a check with the engine verdict', () => {
    expect(stateAfterOutcome('open', null, 'pass')).toBe('bench_pass');
    expect(stateAfterOutcome('bench_pass', 'pass', 'fail')).toBe('no_fit');
    expect(stateAfterOutcome('no_fit', 'fail', 'unknown')).toBe('open');
  });

  it('changes nothing when the verdict is the same', () => {
    expect(stateAfterOutcome('confirmed', 'pass', 'pass')).toBeNull();
    expect(stateAfterOutcome('bench_pass', 'pass', 'pass')).toBeNull();
  });

  it('re-opens a confirmed check whose numbers changed, and leaves retired checks alone', () => {
    expect(stateAfterOutcome('confirmed', 'pass', 'fail')).toBe('open');
    expect(stateAfterOutcome('confirmed', 'unknown', 'pass')).toBe('open');
    expect(stateAfterOutcome('retired', 'pass', 'fail')).toBeNull();
  });
});

describe('canTransition', () => {
  const derived = (state: CheckSnapshot['state'], outcome: 'pass' | 'fail' | 'unknown', evidenceCount: number) => ({
    ...check(state, evidenceCount),
    derived: true,
    outcome,
  });

  it('confirms a passing derived check that has evidence', () => {
    expect(canTransition(derived('bench_pass', 'pass', 1), 'confirmed')).toEqual({ allowed: true });
  });

  it('refuses to confirm without evidence, or when the numbers fail', () => {
    expect(canTransition(derived('bench_pass', 'pass', 0), 'confirmed')).toMatchObject({ allowed: false, message: expect.stringMatching(/evidence/) });
    expect(canTransition(derived('no_fit', 'fail', 3), 'confirmed')).toMatchObject({ allowed: false, message: expect.stringMatching(/does not pass/) });
  });

  it('lets a manual check be confirmed from open with evidence', () => {
    expect(canTransition({ ...check('open', 1), derived: false, outcome: null }, 'confirmed')).toEqual({ allowed: true });
  });

  it('keeps bench pass for the engine', () => {
    expect(canTransition({ ...check('open', 1), derived: false, outcome: null }, 'bench_pass').allowed).toBe(false);
  });
});
