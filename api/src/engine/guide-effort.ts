/**
 * How much a guide asks of its reader: a skill level from a short scale of our own words, and an
 * estimated time in whole minutes (for the guide, and for a step where its author gives one).
 * Shared by the API (validation, published answers) and the studio (labels, formatting).
 */

/** Least demanding first. */
export const SKILL_LEVELS = ['bench_starter', 'shop_regular', 'seasoned_fitter'] as const;
export type SkillLevel = (typeof SKILL_LEVELS)[number];

export const SKILL_LEVEL_WORDS: Record<SkillLevel, { label: string; description: string }> = {
  bench_starter: {
    label: 'Bench starter',
    description: 'Hand tools and a careful eye; nothing to press, heat or machine.',
  },
  shop_regular: {
    label: 'Shop regular',
    description: 'At ease with a press, a torque wrench and taking readings with a micrometer.',
  },
  seasoned_fitter: {
    label: 'Seasoned fitter',
    description: 'Fits to the tenth, press and shrink fits, fabrication and high-voltage isolation.',
  },
};

/** A guide may take up to 100 hours; a single step up to a day. */
export const GUIDE_MINUTES_MAX = 6000;
export const STEP_MINUTES_MAX = 1440;

/** "45 min", "2 h", "1 h 30 min": whole minutes as a reader says them. */
export function formatMinutes(minutes: number): string {
  if (!Number.isInteger(minutes) || minutes < 1) throw new RangeError(`minutes must be a whole number of at least 1, not ${minutes}`);
  const hours = Math.floor(minutes / 60);
  const rest = minutes % 60;
  if (hours === 0) return `${rest} min`;
  return rest === 0 ? `${hours} h` : `${hours} h ${rest} min`;
}

/** The sum of the steps' estimates, or null when no step has one. */
export function stepMinutesTotal(steps: readonly { estimatedMinutes?: number | null }[]): number | null {
  const given = steps.map((step) => step.estimatedMinutes).filter((minutes): minutes is number => typeof minutes === 'number');
  return given.length === 0 ? null : given.reduce((sum, minutes) => sum + minutes, 0);
}
