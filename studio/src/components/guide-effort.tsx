import { Group, Text, Tooltip } from '@mantine/core';
import { formatMinutes, SKILL_LEVELS, SKILL_LEVEL_WORDS, stepMinutesTotal, type SkillLevel } from '@/lib/guide-effort';

export interface GuideEffortProps {
  skillLevel: SkillLevel | null;
  estimatedMinutes: number | null;
  /** The steps' own estimates; their sum stands in when the guide gives no total. */
  steps?: readonly { estimatedMinutes?: number | null }[];
  size?: 'xs' | 'sm';
}

/**
 * "Skill: Shop regular (2 of 3) · About 1 h 30 min": what a guide asks of its reader, in words (the
 * level's place on the scale is written out, never shown by colour or a glyph alone). Nothing when
 * the author gave neither.
 */
export function GuideEffort({ skillLevel, estimatedMinutes, steps = [], size = 'sm' }: GuideEffortProps) {
  const fromSteps = estimatedMinutes === null ? stepMinutesTotal(steps) : null;
  const minutes = estimatedMinutes ?? fromSteps;
  if (!skillLevel && minutes === null) return null;
  return (
    <Group gap="md" wrap="wrap" data-testid="guide-effort">
      {skillLevel && (
        <Tooltip label={SKILL_LEVEL_WORDS[skillLevel].description} multiline w={260} withArrow>
          <Text size={size} data-testid="guide-skill" tabIndex={0}>
            Skill: <strong>{SKILL_LEVEL_WORDS[skillLevel].label}</strong> ({SKILL_LEVELS.indexOf(skillLevel) + 1} of {SKILL_LEVELS.length})
          </Text>
        </Tooltip>
      )}
      {minutes !== null && (
        <Text size={size} data-testid="guide-time">
          Time: about <strong>{formatMinutes(minutes)}</strong>
          {fromSteps !== null ? ' (the steps added up)' : ''}
        </Text>
      )}
    </Group>
  );
}

/** A step's estimate, "about 25 min", or nothing. */
export function StepMinutes({ minutes, size = 'xs' }: { minutes: number | null | undefined; size?: 'xs' | 'sm' }) {
  if (typeof minutes !== 'number') return null;
  return (
    <Text size={size} c="dimmed" span data-testid="step-minutes">
      about {formatMinutes(minutes)}
    </Text>
  );
}
