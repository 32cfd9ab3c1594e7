import { createTheme, type MantineColorsTuple } from '@mantine/core';

// A workshop-floor teal: readable on paper and on a phone in a bright shop.
const patina: MantineColorsTuple = [
  '#e9f6f4', '#d6eae7', '#a9d4ce', '#79bdb4', '#53a99f', '#3a9c91', '#2b958a', '#1c8277', '#0d7369', '#00645a',
];

export const theme = createTheme({
  fontFamily: 'Lexend, system-ui, sans-serif',
  headings: { fontFamily: 'Lexend, system-ui, sans-serif', fontWeight: '600' },
  primaryColor: 'patina',
  // Shade 8 keeps white on filled buttons and the primary on light buttons above 4.5:1 (WCAG AA; axe-core checks it).
  primaryShade: 8,
  colors: { patina },
  defaultRadius: 'sm',
});
