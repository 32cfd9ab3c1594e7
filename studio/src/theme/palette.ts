import type { MantineColorsTuple } from '@mantine/core';

/**
 * Every colour the studio draws with, named by what it means. Components take colours from here, from the Mantine
 * theme (`color="red"`, `var(--mantine-color-…)`) or from the CSS variables in global.css — never as literals
 * (`theme/colour-literals.test.ts` fails on one). Contrast figures are against white (WCAG 2.x: 4.5:1 for text,
 * 3:1 for graphics); axe-core checks the pages in studio/e2e/guide-layout.test.mjs.
 */

// A workshop-floor teal: readable on paper and on a phone in a bright shop.
export const patina: MantineColorsTuple = [
  '#e9f6f4', '#d6eae7', '#a9d4ce', '#79bdb4', '#53a99f', '#3a9c91', '#2b958a', '#1c8277', '#0d7369', '#00645a',
];

/** Lines and words of the diagrams. */
export const ink = {
  /** Text and outlines (15:1). */
  main: '#1f2328',
  /** Secondary words (7.6:1). */
  muted: '#4b535d',
  /** Labels and secondary lines (6:1). */
  slate: '#5c6470',
  /** Leader and projection lines only, never text (3:1). */
  guide: '#8a929c',
  /** What is short or does not fit (7.2:1). */
  short: '#a61b1b',
  /** The page under a diagram, and marks drawn on a filled shape. */
  paper: '#fff',
} as const;

/** The outcomes of a fit (fit checks and readers' fit reports): teal for a fit, red for none. */
export const fitColours = {
  fit: patina[8],
  noFit: '#b3261e',
} as const;

/** The fit-check states (each also has its own shape and words, so colour is never the only sign). */
export const stateColours = {
  open: ink.slate,
  bench_pass: '#1c5fa8',
  confirmed: fitColours.fit,
  no_fit: fitColours.noFit,
  /** Drawn dashed; the word "Retired" stands beside it. */
  retired: '#868e96',
} as const;

/** The fill patterns of the diagrams: a light ground and a darker texture on it. */
export const patternColours = {
  hatch: { ground: patina[1], line: patina[8] },
  dots: { ground: '#fdf1d8', line: '#8a5a00' },
  crosshatch: { ground: '#fbe2e2', line: ink.short },
  stripes: { ground: '#eceff3', line: ink.slate },
} as const;
