import { readingText, resolutionOfDigits } from './spoken-reading';

describe('spoken readings', () => {
  it('writes mined amounts as plain decimals (common practice: no exponent form in stored readings)', () => {
    expect(readingText(0.015)).toBe('0.015');
    expect(readingText(22)).toBe('22');
    expect(readingText(0.0000005)).toBe('0.0000005');
  });

  it('reads the resolution from the last spoken digit', () => {
    expect(resolutionOfDigits('0.015')).toBe('0.001');
    expect(resolutionOfDigits('1.25')).toBe('0.01');
    expect(resolutionOfDigits('22')).toBe('1');
    expect(resolutionOfDigits('0.0005')).toBe('0.0001');
  });
});
