/**
 * ISO 286-1 data for nominal sizes up to 500 mm, in micrometres, as the standard prints them.
 *
 * Provenance: written from memory of ISO 286-1 (Tables 1, 2 and 3). What is checked (fits.spec.ts):
 * ISO 286-2 limit deviations recalled row by row, IT2–IT8 typed a second time and compared, Δ against
 * those independent IT values, IT5–IT16 against the standard's tolerance-unit formula, and the
 * standard's own symmetry rules (EI = −es, the Δ rule) as properties. No outside data set is compared.
 *
 * Ranges are "over the previous bound up to and including this bound": 30 mm belongs to "over 18
 * up to 30"; the first range is "up to and including 3".
 */

/** Upper bounds of the main size ranges (ISO 286-1 Table 1), mm. */
export const MAIN_RANGE_UPPER_BOUNDS_MM = [3, 6, 10, 18, 30, 50, 80, 120, 180, 250, 315, 400, 500] as const;

/** Upper bounds of the intermediate ranges used by the fundamental-deviation tables, mm. */
export const INTERMEDIATE_RANGE_UPPER_BOUNDS_MM = [
  3, 6, 10, 14, 18, 24, 30, 40, 50, 65, 80, 100, 120, 140, 160, 180, 200, 225, 250, 280, 315, 355, 400, 450, 500,
] as const;

export const MIN_IT_GRADE = 1;
export const MAX_IT_GRADE = 16;

/**
 * Standard tolerance values IT1–IT16, µm, one entry per main range (ISO 286-1 Table 1).
 * Index 0 is IT1.
 */
export const STANDARD_TOLERANCES_UM: readonly (readonly number[])[] = [
  /* IT1  */ [0.8, 1, 1, 1.2, 1.5, 1.5, 2, 2.5, 3.5, 4.5, 6, 7, 8],
  /* IT2  */ [1.2, 1.5, 1.5, 2, 2.5, 2.5, 3, 4, 5, 7, 8, 9, 10],
  /* IT3  */ [2, 2.5, 2.5, 3, 4, 4, 5, 6, 8, 10, 12, 13, 15],
  /* IT4  */ [3, 4, 4, 5, 6, 7, 8, 10, 12, 14, 16, 18, 20],
  /* IT5  */ [4, 5, 6, 8, 9, 11, 13, 15, 18, 20, 23, 25, 27],
  /* IT6  */ [6, 8, 9, 11, 13, 16, 19, 22, 25, 29, 32, 36, 40],
  /* IT7  */ [10, 12, 15, 18, 21, 25, 30, 35, 40, 46, 52, 57, 63],
  /* IT8  */ [14, 18, 22, 27, 33, 39, 46, 54, 63, 72, 81, 89, 97],
  /* IT9  */ [25, 30, 36, 43, 52, 62, 74, 87, 100, 115, 130, 140, 155],
  /* IT10 */ [40, 48, 58, 70, 84, 100, 120, 140, 160, 185, 210, 230, 250],
  /* IT11 */ [60, 75, 90, 110, 130, 160, 190, 220, 250, 290, 320, 360, 400],
  /* IT12 */ [100, 120, 150, 180, 210, 250, 300, 350, 400, 460, 520, 570, 630],
  /* IT13 */ [140, 180, 220, 270, 330, 390, 460, 540, 630, 720, 810, 890, 970],
  /* IT14 */ [250, 300, 360, 430, 520, 620, 740, 870, 1000, 1150, 1300, 1400, 1550],
  /* IT15 */ [400, 480, 580, 700, 840, 1000, 1200, 1400, 1600, 1850, 2100, 2300, 2500],
  /* IT16 */ [600, 750, 900, 1100, 1300, 1600, 1900, 2200, 2500, 2900, 3200, 3600, 4000],
];

/**
 * Δ = ITn − IT(n−1), µm, for hole grades IT3–IT8, one entry per main range (ISO 286-1 Table 3, right-hand columns).
 * Added to ES for K, M, N up to IT8 and P to ZC up to IT7.
 */
export const DELTA_UM: Readonly<Record<3 | 4 | 5 | 6 | 7 | 8, readonly number[]>> = {
  3: [0, 1, 1, 1, 1.5, 1.5, 2, 2, 3, 3, 4, 4, 5],
  4: [0, 1.5, 1.5, 2, 2, 3, 3, 4, 4, 4, 4, 5, 5],
  5: [0, 1, 2, 3, 3, 4, 5, 5, 6, 6, 7, 7, 7],
  6: [0, 3, 3, 3, 4, 5, 6, 7, 7, 9, 9, 11, 13],
  7: [0, 4, 6, 7, 8, 9, 11, 13, 15, 17, 20, 21, 23],
  8: [0, 6, 7, 9, 12, 14, 16, 19, 23, 26, 29, 32, 34],
};

/** Shaft letters whose fundamental deviation is the upper deviation es (≤ 0). */
export type UpperDeviationShaftLetter = 'a' | 'b' | 'c' | 'cd' | 'd' | 'e' | 'ef' | 'f' | 'fg' | 'g' | 'h';
/** Shaft letters whose fundamental deviation is the lower deviation ei (≥ 0). js and j are not tabulated here. */
export type LowerDeviationShaftLetter =
  | 'k' | 'm' | 'n' | 'p' | 'r' | 's' | 't' | 'u' | 'v' | 'x' | 'y' | 'z' | 'za' | 'zb' | 'zc';

/** `null` where the standard gives no value ("—"). */
type IntermediateRow = readonly (number | null)[];

const NOT_TABULATED_ABOVE_50_MM: readonly null[] = Array<null>(16).fill(null);

/**
 * Upper deviation es of shafts a–h, µm, per intermediate range (ISO 286-1 Table 2).
 * Holes A–H use EI = −es. cd, ef and fg (intermediate deviations for fine mechanics) stop at 50 mm.
 */
export const SHAFT_UPPER_DEVIATIONS_UM: Readonly<Record<UpperDeviationShaftLetter, IntermediateRow>> = {
  a: [-270, -270, -280, -290, -290, -300, -300, -310, -320, -340, -360, -380, -410, -460, -520, -580, -660, -740, -820, -920, -1050, -1200, -1350, -1500, -1650],
  b: [-140, -140, -150, -150, -150, -160, -160, -170, -180, -190, -200, -220, -240, -260, -280, -310, -340, -380, -420, -480, -540, -600, -680, -760, -840],
  c: [-60, -70, -80, -95, -95, -110, -110, -120, -130, -140, -150, -170, -180, -200, -210, -230, -240, -260, -280, -300, -330, -360, -400, -440, -480],
  cd: [-34, -46, -56, -70, -70, -85, -85, -100, -100, ...NOT_TABULATED_ABOVE_50_MM],
  d: [-20, -30, -40, -50, -50, -65, -65, -80, -80, -100, -100, -120, -120, -145, -145, -145, -170, -170, -170, -190, -190, -210, -210, -230, -230],
  e: [-14, -20, -25, -32, -32, -40, -40, -50, -50, -60, -60, -72, -72, -85, -85, -85, -100, -100, -100, -110, -110, -125, -125, -135, -135],
  ef: [-10, -14, -18, -23, -23, -28, -28, -35, -35, ...NOT_TABULATED_ABOVE_50_MM],
  f: [-6, -10, -13, -16, -16, -20, -20, -25, -25, -30, -30, -36, -36, -43, -43, -43, -50, -50, -50, -56, -56, -62, -62, -68, -68],
  fg: [-4, -6, -8, -10, -10, -12, -12, -15, -15, ...NOT_TABULATED_ABOVE_50_MM],
  g: [-2, -4, -5, -6, -6, -7, -7, -9, -9, -10, -10, -12, -12, -14, -14, -14, -15, -15, -15, -17, -17, -18, -18, -20, -20],
  h: Array<number>(25).fill(0),
};

/**
 * Lower deviation ei of shafts k–zc, µm, per intermediate range (ISO 286-1 Table 2).
 * The k row is for IT4–IT7; k finer than IT4 or coarser than IT7 has ei = 0.
 * Holes K–ZC use ES = −ei (+ Δ where the rule applies).
 */
export const SHAFT_LOWER_DEVIATIONS_UM: Readonly<Record<LowerDeviationShaftLetter, IntermediateRow>> = {
  k: [0, 1, 1, 1, 1, 2, 2, 2, 2, 2, 2, 3, 3, 3, 3, 3, 4, 4, 4, 4, 4, 4, 4, 5, 5],
  m: [2, 4, 6, 7, 7, 8, 8, 9, 9, 11, 11, 13, 13, 15, 15, 15, 17, 17, 17, 20, 20, 21, 21, 23, 23],
  n: [4, 8, 10, 12, 12, 15, 15, 17, 17, 20, 20, 23, 23, 27, 27, 27, 31, 31, 31, 34, 34, 37, 37, 40, 40],
  p: [6, 12, 15, 18, 18, 22, 22, 26, 26, 32, 32, 37, 37, 43, 43, 43, 50, 50, 50, 56, 56, 62, 62, 68, 68],
  r: [10, 15, 19, 23, 23, 28, 28, 34, 34, 41, 43, 51, 54, 63, 65, 68, 77, 80, 84, 94, 98, 108, 114, 126, 132],
  s: [14, 19, 23, 28, 28, 35, 35, 43, 43, 53, 59, 71, 79, 92, 100, 108, 122, 130, 140, 158, 170, 190, 208, 232, 252],
  t: [null, null, null, null, null, null, 41, 48, 54, 66, 75, 91, 104, 122, 134, 146, 166, 180, 196, 218, 240, 268, 294, 330, 360],
  u: [18, 23, 28, 33, 33, 41, 48, 60, 70, 87, 102, 124, 144, 170, 190, 210, 236, 258, 284, 315, 350, 390, 435, 490, 540],
  v: [null, null, null, null, 39, 47, 55, 68, 81, 102, 120, 146, 172, 202, 228, 252, 284, 310, 340, 385, 425, 475, 530, 595, 660],
  x: [20, 28, 34, 40, 45, 54, 64, 80, 97, 122, 146, 178, 210, 248, 280, 310, 350, 385, 425, 475, 525, 590, 660, 740, 820],
  y: [null, null, null, null, null, 63, 75, 94, 114, 144, 174, 214, 254, 300, 340, 380, 425, 470, 520, 580, 650, 730, 820, 920, 1000],
  z: [26, 35, 42, 50, 60, 73, 88, 112, 136, 172, 210, 258, 310, 365, 415, 465, 520, 575, 640, 710, 790, 900, 1000, 1100, 1250],
  za: [32, 42, 52, 64, 77, 98, 118, 148, 180, 226, 274, 335, 400, 470, 535, 600, 670, 740, 820, 920, 1000, 1150, 1300, 1450, 1600],
  zb: [40, 50, 67, 90, 108, 136, 160, 200, 242, 300, 360, 445, 525, 620, 700, 780, 880, 960, 1050, 1200, 1300, 1500, 1650, 1850, 2100],
  zc: [60, 80, 97, 130, 150, 188, 218, 274, 325, 405, 480, 585, 690, 800, 900, 1000, 1150, 1250, 1350, 1550, 1700, 1900, 2100, 2400, 2600],
};
