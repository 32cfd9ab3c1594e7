/**
 * Safety topics of a guide and the usual cautions that go with them. The texts are our own wording of
 * common shop practice; the signal words are those of ANSI Z535 (DANGER, WARNING, CAUTION, NOTICE).
 * Topics are found in a guide's plain text so a guide about pressing a bearing shows the press caution
 * even when its author forgot to tick the box.
 */

export const SAFETY_TOPICS = ['lifting', 'rotating_parts', 'high_voltage', 'welding', 'pressing'] as const;
export type SafetyTopic = (typeof SAFETY_TOPICS)[number];

/** ANSI Z535 signal words, most severe first. */
export const CAUTION_LEVELS = ['DANGER', 'WARNING', 'CAUTION', 'NOTICE'] as const;
export type CautionLevel = (typeof CAUTION_LEVELS)[number];

export interface StandardCaution {
  topic: SafetyTopic;
  level: CautionLevel;
  text: string;
}

/** Shown on every published guide, whatever its topics. */
export const GUIDE_DISCLAIMER =
  'This guide records one workshop’s experience. It does not replace the vehicle or part manufacturer’s service ' +
  'information, local regulations and codes, or the judgement of a licensed professional. Work within your training.';

const STANDARD_CAUTIONS: Record<SafetyTopic, Omit<StandardCaution, 'topic'>> = {
  high_voltage: {
    level: 'DANGER',
    text:
      'High-voltage traction systems can kill. Isolate and lock out the battery, wait the discharge time the manufacturer ' +
      'gives, and prove zero voltage with a meter rated for the system before touching any conductor. Only trained people ' +
      'should open high-voltage parts.',
  },
  lifting: {
    level: 'WARNING',
    text:
      'A jack is not a support. Raise the vehicle at the maker’s lifting points on firm, level ground and hold it on rated ' +
      'stands or a lift with its locks engaged before going underneath.',
  },
  rotating_parts: {
    level: 'WARNING',
    text:
      'Shafts and couplers can turn without warning. Isolate the drive before reaching in, keep hands, hair, clothing and ' +
      'tools clear, and refit every guard before running it.',
  },
  pressing: {
    level: 'WARNING',
    text:
      'Presses and pullers store great force; a part can shatter or fly out. Wear eye protection, support the part on the ' +
      'correct adapters, stay within the press’s rating and keep clear of the line of force. A part heated for a shrink ' +
      'fit burns: handle it with heat-resistant gloves.',
  },
  welding: {
    level: 'WARNING',
    text:
      'Welding and cutting bring arc light, fumes, hot metal and fire. Protect eyes and skin, ventilate, keep an ' +
      'extinguisher at hand, clear flammables, and protect the vehicle’s electronics as its manufacturer directs.',
  },
};

/** Word patterns per topic, tested on lower-case plain text. Deliberately narrow: "press the button" is not pressing. */
const TOPIC_PATTERNS: Record<SafetyTopic, RegExp[]> = {
  lifting: [
    /\bjack(s|ed|ing)?\b/,
    /\b(axle|jack) stands?\b/,
    /\b(vehicle|two-post|four-post|scissor|car) lift\b/,
    /\bon (the|a) lift\b/,
    /\bhoist(s|ed|ing)?\b/,
    /\bengine crane\b/,
    /\braise (the|your) (vehicle|truck|car|pickup|van)\b/,
    /\bunder the (vehicle|truck|car|pickup|van)\b/,
  ],
  rotating_parts: [
    /\brotat(e|es|ed|ing|ion)\b/,
    /\bspin(s|ning)?( it)? up\b/,
    /\bspinning\b/,
    // Shafts of a drive line, but not a screwdriver's shaft, a lift shaft or a shaft of light.
    /(?<!\b(screwdriver|elevator|lift|mine|ventilation|air|arrow|golf|feather) )\b((drive|prop(eller)?|half|input|output|motor|main|lay|counter|pinion|axle|cam|crank|jack) ?)?shafts?\b(?! of (light|sunlight))/,
    /\b(driveshaft|propshaft|halfshaft|layshaft|countershaft|camshaft|crankshaft)s?\b/,
    // A coupler or coupling of a drive, not of a trailer, a hose or an air line.
    /(?<!\b(trailer|hitch|hose|air|quick|quick-release|pipe|pneumatic|hydraulic|fuel|water|garden|tow|train|rail) )\bcoupl(er|ers|ing|ings)\b(?! (hose|nut|fitting)s?\b)/,
    /\b(flywheel|flex ?plate|pulley|sprocket|impeller|rotor)s?\b/,
    /\b(cv|constant[- ]velocity|universal|u|uj)[- ]joints?\b/,
    /\b(drive|fan|timing|serpentine|v)[- ]belts?\b/,
    /\b\d[\d,]* ?rpm\b/,
    /\b(run|running|spin|turn|turning|bump|bumping) (it|the (motor|engine|drive|shaft|wheels?)) (over|up)\b/,
    /\b(run|running|spin) the (motor|engine|drive)\b/,
  ],
  high_voltage: [
    /\bhigh[- ]voltage\b/,
    /\btraction (battery|pack|motor)\b/,
    /\bbattery pack\b/,
    /\binverter\b/,
    /\borange (cable|cables|lead|leads)\b/,
    /\b([6-9]\d|\d{3,4}) ?v(olts?|dc)?\b/,
  ],
  welding: [/\bweld(s|ed|er|ing)?\b/, /\b(mig|tig|stick|arc) (weld|welder|welding)\b/, /\btack(ed)? (it|weld)\b/, /\bplasma cut\w*\b/, /\b(cutting|oxy-?acetylene) torch\b/],
  pressing: [
    /\bpress(es|ed|ing)? (it|them) (in|on|out|off|into|onto)\b/,
    /\bpress(es|ed|ing)? (the|a|an|its|new) (\w+ ){0,2}(bearing|bush|bushing|race|seal|pin|stud|sleeve|coupler|gear|hub)s?\b/,
    /\bpress[- ]fit\w*\b/,
    /\b(hydraulic|arbor|shop|bearing) press\b/,
    /\b(bearing|gear|hub) puller\b/,
    // Heating a part to shrink it on is the other way of making an interference fit.
    /\bshrink[- ](fit|on)\w*\b/,
    /\b(heat|heats|heated|heating) (the|a|an|its|new) (\w+ ){0,2}(bearing|race|ring|gear|hub|coupler|sleeve|flange)s?\b/,
  ],
};

/** Topics whose patterns appear in the text, in the order of SAFETY_TOPICS. */
export function detectSafetyTopics(text: string): SafetyTopic[] {
  const lower = text.toLowerCase();
  return SAFETY_TOPICS.filter((topic) => TOPIC_PATTERNS[topic].some((pattern) => pattern.test(lower)));
}

/** The usual cautions for the given topics, most severe first, each topic once. */
export function standardCautions(topics: readonly SafetyTopic[]): StandardCaution[] {
  const unique = SAFETY_TOPICS.filter((topic) => topics.includes(topic));
  return unique
    .map((topic) => ({ topic, ...STANDARD_CAUTIONS[topic] }))
    .sort((a, b) => CAUTION_LEVELS.indexOf(a.level) - CAUTION_LEVELS.indexOf(b.level));
}
