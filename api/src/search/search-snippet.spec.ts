import { highlightSnippet, plainWords } from './search-snippet';

const joined = (segments: { text: string }[]) => segments.map((segment) => segment.text).join('');

describe('highlightSnippet', () => {
  it('marks each word that starts with a searched term, whatever its case', () => {
    expect(highlightSnippet('Check the Spline count: splines must agree', ['spline'])).toEqual([
      { text: 'Check the ', match: false },
      { text: 'Spline', match: true },
      { text: ' count: ', match: false },
      { text: 'splines', match: true },
      { text: ' must agree', match: false },
    ]);
  });

  it('does not mark a term inside another word', () => {
    expect(highlightSnippet('unsplined shaft', ['spline']).some((segment) => segment.match)).toBe(false);
  });

  it('keeps markup as text: a hit never carries HTML the reader did not see as words', () => {
    const segments = highlightSnippet('<p>Torque the <strong>bolts</strong> &lt;script&gt;</p>', ['bolts']);
    expect(joined(segments)).toBe('Torque the bolts <script>');
    expect(segments).toContainEqual({ text: 'bolts', match: true });
  });

  it('centres a long text on the first hit and marks what was left out', () => {
    const text = `${'lead '.repeat(100)}pilot bearing ${'tail '.repeat(100)}`;
    const segments = highlightSnippet(text, ['pilot'], 60);
    expect(segments[0]).toEqual({ text: '… ', match: false });
    expect(segments.at(-1)).toEqual({ text: ' …', match: false });
    expect(segments).toContainEqual({ text: 'pilot', match: true });
    expect(joined(segments).length).toBeLessThanOrEqual(60 + 4);
  });

  it('gives the start of the text when no word matches (a part-number hit)', () => {
    expect(highlightSnippet('Coupler HL-21-CPL', [])).toEqual([{ text: 'Coupler HL-21-CPL', match: false }]);
  });
});

describe('plainWords', () => {
  it('drops tags and decodes the entities the rich-text cleaner writes', () => {
    expect(plainWords('<p>a&nbsp;&amp;&nbsp;b</p><p>c</p>')).toBe('a & b c');
  });
});
