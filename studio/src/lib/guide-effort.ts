/**
 * A guide's skill level and time estimates, in the API's own words and format: the scale and the
 * minutes formatting are the engine's (api/src/engine/guide-effort.ts), imported rather than copied.
 */
export { GUIDE_MINUTES_MAX, SKILL_LEVELS, SKILL_LEVEL_WORDS, STEP_MINUTES_MAX, formatMinutes, stepMinutesTotal } from '@fitwright/engine';
export type { SkillLevel } from '@fitwright/engine';
