import { patternColours } from '@/theme/palette';

/**
 * Fill patterns shared by the diagrams, so each area reads by its texture and its label as well
 * as its colour (a printed page or a colour-blind reader still tells them apart).
 */
export interface PatternIds {
  hatch: string;
  dots: string;
  crosshatch: string;
  stripes: string;
}

export function patternIds(prefix: string): PatternIds {
  // useId() may contain characters that url(#…) references do not survive.
  const safe = prefix.replace(/[^A-Za-z0-9_-]/g, '');
  return { hatch: `${safe}-hatch`, dots: `${safe}-dots`, crosshatch: `${safe}-crosshatch`, stripes: `${safe}-stripes` };
}

export function DiagramPatterns({ ids }: { ids: PatternIds }) {
  return (
    <defs>
      <pattern id={ids.hatch} width="8" height="8" patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
        <rect width="8" height="8" fill={patternColours.hatch.ground} />
        <line x1="0" y1="0" x2="0" y2="8" stroke={patternColours.hatch.line} strokeWidth="2" />
      </pattern>
      <pattern id={ids.dots} width="8" height="8" patternUnits="userSpaceOnUse">
        <rect width="8" height="8" fill={patternColours.dots.ground} />
        <circle cx="4" cy="4" r="1.6" fill={patternColours.dots.line} />
      </pattern>
      <pattern id={ids.crosshatch} width="8" height="8" patternUnits="userSpaceOnUse">
        <rect width="8" height="8" fill={patternColours.crosshatch.ground} />
        <path d="M0 0L8 8M8 0L0 8" stroke={patternColours.crosshatch.line} strokeWidth="1.4" />
      </pattern>
      <pattern id={ids.stripes} width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(-45)">
        <rect width="6" height="6" fill={patternColours.stripes.ground} />
        <line x1="0" y1="0" x2="0" y2="6" stroke={patternColours.stripes.line} strokeWidth="1.5" />
      </pattern>
    </defs>
  );
}
