import type { CautionLevel, SafetyTopic } from '../api/types';

export const SAFETY_TOPIC_LABELS: Record<SafetyTopic, { name: string; hint: string }> = {
  lifting: { name: 'Lifting', hint: 'jacks, stands, hoists, a lift' },
  rotating_parts: { name: 'Rotating parts', hint: 'shafts, couplers, spinning a motor under power' },
  high_voltage: { name: 'High voltage', hint: 'traction batteries, inverters, orange cabling' },
  welding: { name: 'Welding', hint: 'arc, gas or spot welding, grinding sparks' },
  pressing: { name: 'Pressing', hint: 'a hydraulic press, pressing bearings or bushes' },
};

/** What each ANSI Z535 signal word means, for the editor's level picker (the look is components/signal-word). */
export const CAUTION_LOOK: Record<CautionLevel, { meaning: string }> = {
  DANGER: { meaning: 'will cause death or serious injury' },
  WARNING: { meaning: 'could cause death or serious injury' },
  CAUTION: { meaning: 'could cause minor or moderate injury' },
  NOTICE: { meaning: 'could damage parts or the vehicle, not people' },
};

/** Names for the kinds of marks a step can carry (the marks feature has the full set). */
export const MARK_KIND_NAMES: Record<string, string> = {
  part: 'Part',
  measurement: 'Measurement',
  check_evidence: 'Check evidence',
  step: 'Step',
  caution: 'Caution',
  note: 'Note',
};
