import { sanitizeRichText, slugFromTitle } from './rich-text';

describe('sanitizeRichText', () => {
  it('keeps what the editor produces', () => {
    const html = '<h3>Fit the coupler</h3><p>Slide it on <strong>by hand</strong>, <em>never</em> hammer it.</p><ul><li>Clean the splines</li></ul>';
    expect(sanitizeRichText(html)).toBe(html);
  });

  // Attack strings after the OWASP XSS Filter Evasion Cheat Sheet (script tag, event handler, javascript: URL).
  it.each([
    ['<p>ok</p><script>alert(1)</script>', '<p>ok</p>'],
    ['<p onclick="alert(1)">ok</p>', '<p>ok</p>'],
    ['<img src=x onerror=alert(1)><p>ok</p>', '<p>ok</p>'],
    ['<a href="javascript:alert(1)">x</a>', '<a target="_blank" rel="noopener noreferrer nofollow">x</a>'],
    ['<p style="position:fixed">ok</p><iframe src="https://example.com"></iframe>', '<p>ok</p>'],
  ])('drops what could run or restyle the page: %s', (dirty, clean) => {
    expect(sanitizeRichText(dirty)).toBe(clean);
  });

  it('makes links open in a new tab without handing over the opener', () => {
    expect(sanitizeRichText('<p><a href="https://example.org/torque">torque table</a></p>')).toBe(
      '<p><a href="https://example.org/torque" target="_blank" rel="noopener noreferrer nofollow">torque table</a></p>',
    );
  });

  it('stores an emptied editor as no text', () => {
    expect(sanitizeRichText('<p></p>')).toBe('');
    expect(sanitizeRichText('  ')).toBe('');
  });
});

describe('slugFromTitle', () => {
  it('makes lower-case dashed ASCII words', () => {
    expect(slugFromTitle('Fitting the 21-tooth coupler: step by step')).toBe('fitting-the-21-tooth-coupler-step-by-step');
    expect(slugFromTitle('Pilot bearing — 15 mm bore, “new” race')).toBe('pilot-bearing-15-mm-bore-new-race');
  });

  it('falls back to "guide" when nothing usable is left', () => {
    expect(slugFromTitle('???')).toBe('guide');
  });
});
