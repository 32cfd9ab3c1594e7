import { readdirSync, readFileSync } from 'node:fs';
import { dirname, join, relative } from 'node:path';
import { describe, expect, it } from 'vitest';

/**
 * Colours live in the theme (theme/palette.ts, theme/theme.ts, theme/global.css) and Mantine's variables, so a
 * change of palette or a contrast fix is made once. This fails on a colour literal anywhere else in src/.
 */

// The folder above this file's (jsdom's URL class will not turn import.meta.url into a path).
const SRC = dirname(dirname(decodeURIComponent(new globalThis.URL(import.meta.url).pathname)));

/** Files that may hold a literal colour, each with its reason. Keep it short: prefer a token in theme/palette.ts. */
const ALLOWED: readonly { file: string; literal: string; reason: string }[] = [];

/** Not scanned: the theme itself, and the contract generated from the API (its examples are the API's text). */
const SKIPPED = [/^theme\//, /^lib\/api-contract\.ts$/];

const NAMED = String.raw`(?<![-\w])(?:white|black|red|green|blue|yellow|orange|purple|pink|brown|gray|grey|silver|navy|maroon|teal|olive|lime|aqua|cyan|magenta|fuchsia|gold|crimson|tomato|coral)(?![-\w])`;
const EVERYWHERE: readonly RegExp[] = [
  // #rgb, #rgba, #rrggbb, #rrggbbaa (not an HTML entity &#123; and not a url(#id) reference).
  /(?<![&\w(])#(?:[0-9a-f]{8}|[0-9a-f]{6}|[0-9a-f]{3,4})\b/gi,
  /\b(?:rgba?|hsla?|hwb|lab|lch|oklab|oklch)\(/gi,
];
/** A named colour as a CSS declaration's value (`color: white`, `border: 1px solid black`); `var(--mantine-color-red-6)` is a token. */
const IN_CSS = new RegExp(
  String.raw`\b(?:color|background(?:-color)?|fill|stroke|border(?:-[a-z]+)*|outline(?:-color)?|box-shadow|text-shadow|caret-color|accent-color)\s*:[^;{}]*${NAMED}`,
  'gi',
);
/**
 * In TSX: a named colour in an SVG attribute (`fill="white"`) or a style value (`border: '1px solid black'`).
 * `color: 'red'` is left alone: in our components it names a Mantine palette colour (a theme token).
 */
const IN_TSX: readonly RegExp[] = [
  new RegExp(String.raw`\b(?:fill|stroke|stopColor|floodColor|lightingColor)=["']${NAMED}["']`, 'gi'),
  new RegExp(String.raw`\b(?:background|backgroundColor|borderColor|border|outline|boxShadow|fill|stroke)\s*:\s*["'\`][^"'\`]*${NAMED}`, 'gi'),
];

function colourLiterals(text: string, css: boolean): string[] {
  const patterns = [...EVERYWHERE, ...(css ? [IN_CSS] : IN_TSX)];
  return patterns.flatMap((pattern) => [...text.matchAll(pattern)].map((match) => match[0]));
}

function sourceFiles(folder: string): string[] {
  return readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const path = join(folder, entry.name);
    if (entry.isDirectory()) return sourceFiles(path);
    return /\.(tsx?|css)$/.test(entry.name) ? [path] : [];
  });
}

describe('colour literals', () => {
  it('finds the literal forms it is meant to refuse, and leaves tokens and references alone', () => {
    expect(colourLiterals('background: #000; color: #c8102e; fill: #ffffffcc', true)).toEqual(['#000', '#c8102e', '#ffffffcc']);
    expect(colourLiterals('box-shadow: 0 6px 8px rgb(0 0 0 / 45%); color: hsl(0 0% 0%)', true)).toHaveLength(2);
    expect(colourLiterals('border: 1px solid black;', true)).toHaveLength(1);
    expect(colourLiterals('<path fill="white" stroke="#fff" />', false)).toEqual(['#fff', 'fill="white"']);
    expect(colourLiterals("style={{ border: '1px solid black' }}", false)).toHaveLength(1);
    expect(colourLiterals('background: var(--mantine-color-black); color: var(--mantine-color-red-7);', true)).toEqual([]);
    expect(colourLiterals("fill={`url(#a-hatch)`} &#123; <Alert color=\"red\"> { color: 'blue', label: 'Uploading' }", false)).toEqual([]);
  });

  it('appear only in the theme (or the allowlist, with a reason)', () => {
    const found = sourceFiles(SRC)
      .map((path) => ({ file: relative(SRC, path).split('\\').join('/'), text: readFileSync(path, 'utf8') }))
      .filter(({ file }) => !SKIPPED.some((skip) => skip.test(file)))
      .flatMap(({ file, text }) => colourLiterals(text, file.endsWith('.css')).map((literal) => ({ file, literal })))
      .filter(({ file, literal }) => !ALLOWED.some((allowed) => allowed.file === file && allowed.literal === literal));
    expect(found, 'use a token from theme/palette.ts, a Mantine variable or a variable in theme/global.css').toEqual([]);
  });
});
