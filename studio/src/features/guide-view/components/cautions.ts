import type { CautionLevel, PublishedGuide, SafetyTopic } from '../api/types';

/** ANSI Z535 signal words, most severe first: the order a reader meets them in. */
export const CAUTION_LEVELS: readonly CautionLevel[] = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'];

export const TOPIC_NAMES: Record<SafetyTopic, string> = {
  lifting: 'Lifting the vehicle',
  rotating_parts: 'Rotating parts',
  high_voltage: 'High voltage',
  welding: 'Welding',
  pressing: 'Pressing',
};

/** One caution as the block at the top shows it: the guide's topic cautions and each step's own. */
export interface CautionItem {
  key: string;
  level: CautionLevel;
  text: string;
  /** Where it comes from: the safety topic's name, or "Step 3: Lift the cab". */
  source: string;
}

/** Every caution of the guide, DANGER first; within a level the topics come first, then the steps in order. */
export function orderedCautions(guide: Pick<PublishedGuide, 'cautions' | 'steps'>): CautionItem[] {
  const items: CautionItem[] = [
    ...guide.cautions.map((caution, index) => ({
      key: `topic-${caution.topic}-${index}`,
      level: caution.level,
      text: caution.text,
      source: TOPIC_NAMES[caution.topic] ?? caution.topic,
    })),
    ...[...guide.steps]
      .sort((a, b) => a.position - b.position)
      .flatMap((step) =>
        step.caution
          ? [{ key: `step-${step.id}`, level: step.caution.level, text: step.caution.text, source: `Step ${step.position}: ${step.title}` }]
          : [],
      ),
  ];
  const rank = (level: CautionLevel) => {
    const found = CAUTION_LEVELS.indexOf(level);
    return found === -1 ? CAUTION_LEVELS.length : found;
  };
  // Array.prototype.sort is stable, so equal levels keep the order above.
  return items.sort((a, b) => rank(a.level) - rank(b.level));
}
