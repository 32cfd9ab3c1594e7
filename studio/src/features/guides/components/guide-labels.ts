import type { CautionLevel, SafetyTopic } from '../api/types';

export const SAFETY_TOPIC_LABELS: Record<SafetyTopic, { name: string; hint: string }> = {
  lifting: { name: 'Lifting', hint: 'jacks, stands, hoists, a lift' },
  rotating_parts: { name: 'Rotating parts', hint: 'shafts, couplers, spinning a motor under power' },
  high_voltage: { name: 'High voltage', hint: 'traction batteries, inverters, orange cabling' },
  welding: { name: 'Welding', hint: 'arc, gas or spot welding, grinding sparks' },
  pressing: { name: 'Pressing', hint: 'a hydraulic press, pressing bearings or bushes' },
};

/**
 * How each signal word looks. The word itself is always shown; the shape (a small SVG path in a
 * 12×12 box) and the colour only help, so the level reads in grey print too.
 */
export const CAUTION_LOOK: Record<CautionLevel, { color: string; shape: string; meaning: string }> = {
  DANGER: { color: 'red', shape: 'M4 0h4l4 4v4l-4 4H4L0 8V4z', meaning: 'will cause death or serious injury' },
  WARNING: { color: 'orange', shape: 'M6 0.5l5.5 11H0.5z', meaning: 'could cause death or serious injury' },
  CAUTION: { color: 'yellow', shape: 'M6 0l6 6-6 6-6-6z', meaning: 'could cause minor or moderate injury' },
  NOTICE: { color: 'blue', shape: 'M1 1h10v10H1z', meaning: 'could damage parts or the vehicle, not people' },
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
