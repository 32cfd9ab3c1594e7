import { createTheme } from '@mantine/core';
import { patina } from './palette';

export const theme = createTheme({
  fontFamily: 'Lexend, system-ui, sans-serif',
  headings: { fontFamily: 'Lexend, system-ui, sans-serif', fontWeight: '600' },
  primaryColor: 'patina',
  // Shade 8 keeps white on filled buttons and the primary on light buttons above 4.5:1 (WCAG AA; axe-core checks it).
  primaryShade: 8,
  colors: { patina },
  defaultRadius: 'sm',
});
